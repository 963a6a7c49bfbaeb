package org.tracegas.runner.commands;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.tracegas.pipeline.FileMeasurements;
import org.tracegas.importer.ReaderRegistry;
import org.tracegas.runner.Command;
import org.tracegas.runner.ExitCode;
import org.tracegas.runner.RunnerContext;
import org.tracegas.runner.UsageException;
import org.tracegas.store.ProjectInfo;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;

/**
 * Imports the lab's files into a project as measurements: each file kept whole by content hash, each record a
 * measurement with its kind, time, title and conditions; a file imported before adds nothing.
 */
public final class ImportCommand implements Command {

    private final ReaderRegistry readers;

    public ImportCommand(ReaderRegistry readers) {
        this.readers = readers;
    }

    /** The command as the runner's extension point creates it: with the readers contributed to the platform. */
    public ImportCommand() {
        this(ReaderRegistry.fromPlatform());
    }

    @Override
    public String name() {
        return "import";
    }

    @Override
    public String summary() {
        return "import spectra or interferograms from files (JCAMP-DX, delimited text, container, contributed)";
    }

    @Override
    public String usage() {
        return "usage: tracegas import <workspace and --as options> --project <code> --file <file> [--file ...]\n"
                + WorkspaceLogin.USAGE + "\n" + FileImports.USAGE + "\n"
                + "  Each file is read by the reader that recognises its content and kept whole under the SHA-256 of\n"
                + "  its bytes; each record becomes a measurement with its kind, time, title and cell conditions from\n"
                + "  the file's labels. A file the project holds already adds nothing. Every file is read before\n"
                + "  anything is stored; a file that cannot be read is named with the line and label at fault.\n"
                + "exit codes: 0 all imported or known, 2 wrong arguments, 3 a file could not be read (nothing"
                + " imported), 5 failure";
    }

    @Override
    public int run(List<String> arguments, RunnerContext context) throws UsageException {
        List<String> rest = new ArrayList<>();
        List<Path> files = Options.repeated(arguments, "--file", rest);
        // --file is among the accepted options only so that a mistyped one is told its nearest name
        List<String> accepted = new ArrayList<>(WorkspaceLogin.optionsWith("--project", "--file"));
        accepted.addAll(FileImports.optionNames());
        Options options = Options.parse(rest, accepted);
        if (files.isEmpty()) {
            throw new UsageException("give at least one --file");
        }
        FileMeasurements.Defaults defaults = FileImports.defaults(options);
        try (WorkspaceStore store = WorkspaceLogin.open(options, context)) {
            Session actor = WorkspaceLogin.logIn(store, options, context);
            ProjectInfo project = StoredMethods.project(store, actor, options.text("--project"));
            FileImports.Outcome outcome;
            try {
                outcome = FileImports.importAll(store, actor, project, readers, files, defaults, context);
            } catch (BadInputException e) {
                context.err().println("tracegas import: " + e.getMessage());
                return ExitCode.BAD_INPUT;
            }
            context.out().printf("Imported %d file(s) into project %s; %d already imported%n", outcome.added(),
                    project.code(), outcome.known());
            return ExitCode.OK;
        }
    }
}
