package org.tracegas.runner.commands;

import java.util.List;

import org.tracegas.runner.Command;
import org.tracegas.runner.ExitCode;
import org.tracegas.runner.RunnerContext;
import org.tracegas.runner.UsageException;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;

/** Creates a workspace (the schema comes with it) and its first administrator. */
public final class WorkspaceInitCommand implements Command {

    @Override
    public String name() {
        return "workspace-init";
    }

    @Override
    public String summary() {
        return "create a workspace and its first administrator";
    }

    @Override
    public String usage() {
        return "usage: tracegas workspace-init (--workspace <folder> | --server <url> --user <u>)\n"
                + "                               --admin <login> --name <printed name>\n"
                + "  The administrator's password is read from $" + WorkspaceLogin.PASSWORD_VARIABLE + ";\n"
                + "  the lab server's as " + WorkspaceLogin.SERVER_PASSWORD_RULE + ".\n"
                + "exit codes: 0 created, 2 wrong arguments, 5 failure, 6 refused (the workspace has users already)";
    }

    @Override
    public int run(List<String> arguments, RunnerContext context) throws UsageException {
        Options options = Options.parse(arguments,
                List.of("--workspace", "--server", "--user", "--admin", "--name"));
        try (WorkspaceStore store = WorkspaceLogin.openOrCreate(options, context)) {
            Session admin = store.users().createFirstAdministrator(options.text("--admin"), options.text("--name"),
                    WorkspaceLogin.password(context, WorkspaceLogin.PASSWORD_VARIABLE));
            context.out().println("Workspace ready; administrator " + admin.login() + " (" + admin.userId() + ")");
            return ExitCode.OK;
        }
    }
}
