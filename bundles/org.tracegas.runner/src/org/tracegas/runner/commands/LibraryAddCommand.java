package org.tracegas.runner.commands;

import java.nio.file.Path;
import java.util.List;

import org.tracegas.library.ReferenceLibrary;
import org.tracegas.library.io.FileFormatException;
import org.tracegas.library.io.LibraryVersionText;
import org.tracegas.method.LabReferenceSource;
import org.tracegas.method.VersionRecorder;
import org.tracegas.model.ContentVersion;
import org.tracegas.model.VersionKind;
import org.tracegas.runner.Command;
import org.tracegas.runner.ExitCode;
import org.tracegas.runner.RunnerContext;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;

/** Records an existing library folder (measured or imported references) as a library version. */
public final class LibraryAddCommand implements Command {

    @Override
    public String name() {
        return "library-add";
    }

    @Override
    public String summary() {
        return "record an existing library folder (its manifest and spectra) as a library version";
    }

    @Override
    public String usage() {
        return "usage: tracegas library-add <workspace and --as options> --manifest <library manifest>\n"
                + WorkspaceLogin.USAGE + "\n" + """
                  Reads the whole library (every reference must be good), then records a LIBRARY version of the
                  manifest text and the SHA-256 of each spectrum file; the same folder again gives no new version.
                exit codes: 0 recorded, 2 wrong arguments, 3 bad manifest or spectrum file (file, line and field
                  named; nothing recorded), 5 failure""";
    }

    @Override
    public int run(List<String> arguments, RunnerContext context) throws Exception {
        Options options = Options.parse(arguments, WorkspaceLogin.optionsWith("--manifest"));
        Path manifest = options.path("--manifest");
        try (WorkspaceStore store = WorkspaceLogin.open(options, context)) {
            Session actor = WorkspaceLogin.logIn(store, options, context);
            ReferenceLibrary library;
            String content;
            try {
                library = LabReferenceSource.manifestReader().read(manifest);
                content = LibraryVersionText.of(manifest);
            } catch (FileFormatException e) {
                context.err().println("tracegas library-add: " + e.getMessage());
                return ExitCode.BAD_INPUT;
            }
            ContentVersion v = VersionRecorder.ensure(store, actor, VersionKind.LIBRARY, library.name(), content,
                    "recorded from " + manifest);
            context.out().printf("Library '%s': %d references, version %d (%s)%n", library.name(),
                    library.references().size(), v.getNumber(), v.getId());
            return ExitCode.OK;
        }
    }
}
