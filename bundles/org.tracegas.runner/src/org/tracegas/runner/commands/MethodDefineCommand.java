package org.tracegas.runner.commands;

import java.util.List;

import org.tracegas.method.MethodDefinition;
import org.tracegas.library.io.FileFormatException;
import org.tracegas.quantify.QuantificationMethod;
import org.tracegas.runner.Command;
import org.tracegas.runner.ExitCode;
import org.tracegas.runner.RunnerContext;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;

/** Builds a quantification method from a method file and its library, and records it as a method version. */
public final class MethodDefineCommand implements Command {

    @Override
    public String name() {
        return "method-define";
    }

    @Override
    public String summary() {
        return "define a quantification method from a method file and its library; record it as a version";
    }

    @Override
    public String usage() {
        return "usage: tracegas method-define <workspace and --as options> --method <method file>\n"
                + WorkspaceLogin.USAGE + "\n" + """
                  The method file (key = value lines) names the method, its library manifest, path length,
                  nonlinearity and fit options, a [transform] block (apodization, phase-correction, sidedness,
                  zero-fill, range) and one [analyte] block per analyte (compound, interferents, region lines
                  such as '2040..2140 baseline 1'). The library is recorded as a version if it is not yet; the
                  method version holds the transform and the method's canonical text with every reference, so
                  any runner rebuilds the exact method from it.
                exit codes: 0 recorded, 2 wrong arguments, 3 bad method file or library (file, line and field
                  named; nothing recorded), 5 failure""";
    }

    @Override
    public int run(List<String> arguments, RunnerContext context) throws Exception {
        Options options = Options.parse(arguments, WorkspaceLogin.optionsWith("--method"));
        try (WorkspaceStore store = WorkspaceLogin.open(options, context)) {
            Session actor = WorkspaceLogin.logIn(store, options, context);
            MethodDefinition.Recorded recorded;
            try {
                recorded = MethodDefinition.read(options.path("--method")).record(store, actor);
            } catch (FileFormatException e) {
                context.err().println("tracegas method-define: " + e.getMessage());
                return ExitCode.BAD_INPUT;
            }
            QuantificationMethod method = recorded.method().method();
            context.out().printf("Method '%s': %d analytes, %d references, version %d (%s), library version %d%n",
                    method.name(), method.analytes().size(), method.references().size(),
                    recorded.methodVersion().getNumber(), recorded.methodVersion().getId(),
                    recorded.libraryVersion().getNumber());
            return ExitCode.OK;
        }
    }
}
