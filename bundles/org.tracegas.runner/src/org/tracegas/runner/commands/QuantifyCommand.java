package org.tracegas.runner.commands;

import java.util.List;

import org.tracegas.campaign.ProjectQuantification;
import org.tracegas.quantify.BatchOutcome;
import org.tracegas.quantify.CancellationFlag;
import org.tracegas.runner.Command;
import org.tracegas.runner.ExitCode;
import org.tracegas.runner.RunnerContext;
import org.tracegas.runner.UsageException;
import org.tracegas.store.ProjectInfo;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;

/** Processes a project's interferogram files with a stored method version on all cores into the workspace. */
public final class QuantifyCommand implements Command {

    private final CancellationFlag cancel;

    public QuantifyCommand(CancellationFlag cancel) {
        this.cancel = cancel;
    }

    @Override
    public String name() {
        return "quantify";
    }

    @Override
    public String summary() {
        return "transform, ratio and fit a project's interferogram files with a stored method, on all cores";
    }

    @Override
    public String usage() {
        return "usage: tracegas quantify <workspace and --as options> " + QuantifyArguments.USAGE_LINE + "\n"
                + WorkspaceLogin.USAGE + "\n"
                + StoredMethods.USAGE + "\n" + """
                  The chosen version of the method is rebuilt from the workspace. Backgrounds are the background
                  records of the --backgrounds files; each sample is ratioed against the last one before it.
                  Every file is read once before anything is stored; each sample is stored with its absorbance
                  and its results, which point at the method and library versions.
                exit codes: 0 done, 2 wrong arguments, 3 bad input file (file, record and field named; nothing
                  stored), the project holds this version's results already or has an unfinished batch-split
                  batch of it (named), 4 cancelled (samples stored so far stay), 5 failure""";
    }

    @Override
    public int run(List<String> commandLine, RunnerContext context) throws Exception {
        QuantifyArguments arguments = QuantifyArguments.parse(commandLine);
        Options options = arguments.options();
        try (WorkspaceStore store = WorkspaceLogin.open(options, context)) {
            Session actor = WorkspaceLogin.logIn(store, options, context);
            ProjectInfo project = StoredMethods.project(store, actor, options.text("--project"));
            ProjectQuantification job = new ProjectQuantification(store, actor, project.id(), StoredMethods.SOFTWARE);
            QuantifyArguments.Checked checked;
            try {
                checked = arguments.check(store, actor, project, job);
            } catch (BadInputException e) {
                context.err().println("tracegas quantify: " + e.getMessage());
                return ExitCode.BAD_INPUT;
            }
            StoredMethods.Found found = checked.found();
            context.progress().begin("quantify");
            BatchOutcome outcome = job.run(found.version(), found.method(), arguments.files(),
                    checked.inputs().samples(), checked.inputs().backgrounds(), context.progress()::update, cancel);
            if (outcome.cancelled()) {
                context.err().println("tracegas quantify: cancelled after " + outcome.delivered() + " spectra");
                return ExitCode.CANCELLED;
            }
            context.out().printf("Processed %d spectra of project %s with method '%s' version %d%n",
                    outcome.delivered(), project.code(), found.method().method().name(), found.version().number());
            return ExitCode.OK;
        }
    }
}
