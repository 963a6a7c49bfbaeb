package org.tracegas.runner.commands;

import java.util.List;

import org.tracegas.model.User;
import org.tracegas.runner.Command;
import org.tracegas.runner.ExitCode;
import org.tracegas.runner.RunnerContext;
import org.tracegas.runner.UsageException;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;

/** Unlocks an account locked after repeated failed log-ins; an administrator acts, and the audit trail says who. */
public final class UserUnlockCommand implements Command {

    @Override
    public String name() {
        return "user-unlock";
    }

    @Override
    public String summary() {
        return "unlock an account locked after failed log-ins (administrator; audited)";
    }

    @Override
    public String usage() {
        return "usage: tracegas user-unlock <workspace and --as options> --login <login of the locked account>\n"
                + WorkspaceLogin.USAGE + "\n"
                + "  Unlocks the account and resets its count of failed log-ins; the audit trail records the\n"
                + "  administrator who did it.\n"
                + "exit codes: 0 unlocked (or was not locked), 2 wrong arguments, 3 no such login, 5 failure,\n"
                + "  6 refused (for example: not an administrator)";
    }

    @Override
    public int run(List<String> arguments, RunnerContext context) throws UsageException {
        Options options = Options.parse(arguments, WorkspaceLogin.optionsWith("--login"));
        String login = options.text("--login");
        try (WorkspaceStore store = WorkspaceLogin.open(options, context)) {
            Session admin = WorkspaceLogin.logIn(store, options, context);
            User user = store.users().findByLogin(login).orElse(null);
            if (user == null) {
                context.err().println("tracegas user-unlock: the workspace has no user with the login '" + login + "'");
                return ExitCode.BAD_INPUT;
            }
            if (!user.isLocked()) {
                context.out().println(login + " is not locked; nothing changed");
                return ExitCode.OK;
            }
            store.users().unlock(admin, user.getId());
            context.out().println("Unlocked " + login + "; the audit trail records the change by " + admin.login());
            return ExitCode.OK;
        }
    }
}
