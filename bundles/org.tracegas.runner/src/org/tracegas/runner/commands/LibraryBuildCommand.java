package org.tracegas.runner.commands;

import java.nio.file.Path;
import java.util.List;

import org.tracegas.library.ReferenceLibrary;
import org.tracegas.library.io.FileFormatException;
import org.tracegas.library.io.LibraryManifestWriter;
import org.tracegas.library.io.LibraryVersionText;
import org.tracegas.method.LibraryPlan;
import org.tracegas.method.LibrarySynthesis;
import org.tracegas.method.VersionRecorder;
import org.tracegas.model.ContentVersion;
import org.tracegas.model.VersionKind;
import org.tracegas.quantify.CancellationFlag;
import org.tracegas.runner.Command;
import org.tracegas.runner.ExitCode;
import org.tracegas.runner.RunnerContext;
import org.tracegas.runner.UsageException;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;

/** Synthesizes the references of a library plan into a library folder and records it as a library version. */
public final class LibraryBuildCommand implements Command {

    private final CancellationFlag cancel;

    public LibraryBuildCommand(CancellationFlag cancel) {
        this.cancel = cancel;
    }

    /** The command as the runner's extension point creates it: it stops on the runner's cancellation. */
    public LibraryBuildCommand() {
        this(null);
    }

    @Override
    public String name() {
        return "library-build";
    }

    @Override
    public String summary() {
        return "synthesize reference spectra from HITRAN-format line lists into a library folder and record it";
    }

    @Override
    public String usage() {
        return "usage: tracegas library-build <workspace and --as options> --plan <library plan> --out <new folder>\n"
                + WorkspaceLogin.USAGE + "\n" + """
                  The plan (key = value lines) names the library, the cell (temperature K, pressure kPa,
                  path-length m), resolution cm-1, apodization, the output axis (first-wavenumber, step, points),
                  uncertainty, and one [compound] block per gas (name, cas, formula, molar-mass, line-list,
                  partition table|constants|linear|non-linear with partition-table for a Q(T) file, ppm-m
                  list). The folder gets library.manifest and one two-column
                  text file per reference; the workspace records a LIBRARY version of the manifest text and
                  the SHA-256 of each file.
                exit codes: 0 built and recorded, 2 wrong arguments, 3 bad plan or line list (file, line and
                  field named; nothing written), 4 cancelled, 5 failure""";
    }

    @Override
    public int run(List<String> arguments, RunnerContext context) throws Exception {
        Options options = Options.parse(arguments, WorkspaceLogin.optionsWith("--plan", "--out"));
        Path out = options.path("--out");
        try (WorkspaceStore store = WorkspaceLogin.open(options, context)) {
            Session actor = WorkspaceLogin.logIn(store, options, context);
            LibraryPlan plan;
            ReferenceLibrary library;
            try {
                plan = LibraryPlan.read(options.path("--plan"));
                context.progress().begin("synthesis");
                library = LibrarySynthesis.run(plan, context.progress()::update,
                        cancel != null ? cancel : context.cancellation());
            } catch (FileFormatException e) {
                context.err().println("tracegas library-build: " + e.getMessage());
                return ExitCode.BAD_INPUT;
            }
            if (library == null) {
                context.err().println("tracegas library-build: cancelled; nothing written");
                return ExitCode.CANCELLED;
            }
            Path manifest = new LibraryManifestWriter().write(library, out);
            ContentVersion v;
            try {
                v = VersionRecorder.ensure(store, actor, VersionKind.LIBRARY, library.name(),
                        LibraryVersionText.of(manifest), "synthesized from " + plan.file().getFileName());
            } catch (RuntimeException e) {
                // a folder without its version would look recorded; take it away again
                LibraryManifestWriter.delete(out);
                throw e;
            }
            context.out().printf("Library '%s': %d references in %s, version %d (%s)%n", library.name(),
                    library.references().size(), out, v.getNumber(), v.getId());
            return ExitCode.OK;
        }
    }
}
