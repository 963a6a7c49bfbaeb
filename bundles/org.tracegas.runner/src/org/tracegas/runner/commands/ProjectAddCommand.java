package org.tracegas.runner.commands;

import java.util.List;

import org.tracegas.model.Client;
import org.tracegas.model.Project;
import org.tracegas.runner.Command;
import org.tracegas.runner.ExitCode;
import org.tracegas.runner.RunnerContext;
import org.tracegas.runner.UsageException;
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
                + "  A project of a client the user already works for joins that client.\n"
                + "exit codes: 0 added, 2 wrong arguments, 5 failure (for example: the client has a project of that "
                + "code already), 6 refused";
    }

    @Override
    public int run(List<String> arguments, RunnerContext context) throws UsageException {
        Options options = Options.parse(arguments, WorkspaceLogin.optionsWith("--client", "--code", "--name"));
        try (WorkspaceStore store = WorkspaceLogin.open(options, context)) {
            Session actor = WorkspaceLogin.logIn(store, options, context);
            // a client's second project joins the client the user already works for
            String client = options.text("--client");
            String clientId = store.projects().clients(actor).stream().filter(c -> c.getName().equals(client))
                    .map(Client::getId).findFirst().orElseGet(() -> store.projects().createClient(actor,
                            client).getId());
            Project project = store.projects().createProject(actor, clientId, options.text("--code"),
                    options.text("--name"));
            context.out().println("Added project " + project.getCode() + " (" + project.getId() + ")");
            return ExitCode.OK;
        }
    }
}
