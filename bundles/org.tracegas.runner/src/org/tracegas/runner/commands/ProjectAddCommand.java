package org.tracegas.runner.commands;

import java.util.List;

import org.tracegas.runner.Command;
import org.tracegas.runner.ExitCode;
import org.tracegas.runner.RunnerContext;
import org.tracegas.runner.UsageException;
import org.tracegas.store.ProjectInfo;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;

/** Adds a client and a project (a campaign) of that client. */
public final class ProjectAddCommand implements Command {

    @Override
    public String name() {
        return "project-add";
    }

    @Override
    public String summary() {
        return "add a client's project (a measurement campaign)";
    }

    @Override
    public String usage() {
        return "usage: tracegas project-add <workspace and --as options> --client <client name> --code <code>\n"
                + "                            --name <project name>\n" + WorkspaceLogin.USAGE + "\n"
                + "exit codes: 0 added, 2 wrong arguments, 5 failure";
    }

    @Override
    public int run(List<String> arguments, RunnerContext context) throws UsageException {
        Options options = Options.parse(arguments, WorkspaceLogin.optionsWith("--client", "--code", "--name"));
        try (WorkspaceStore store = WorkspaceLogin.open(options, context)) {
            Session actor = WorkspaceLogin.logIn(store, options, context);
            String clientId = store.projects().createClient(actor, options.text("--client"));
            ProjectInfo project = store.projects().createProject(actor, clientId, options.text("--code"),
                    options.text("--name"));
            context.out().println("Added project " + project.code() + " (" + project.id() + ")");
            return ExitCode.OK;
        }
    }
}
