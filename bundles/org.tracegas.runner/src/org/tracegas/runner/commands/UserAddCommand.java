package org.tracegas.runner.commands;

import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;

import org.tracegas.model.Role;
import org.tracegas.model.User;
import org.tracegas.runner.Command;
import org.tracegas.runner.ExitCode;
import org.tracegas.runner.RunnerContext;
import org.tracegas.runner.UsageException;
import org.tracegas.store.WorkspaceStore;

/** Adds a user with roles; an administrator acts. */
public final class UserAddCommand implements Command {

    static final String NEW_PASSWORD_VARIABLE = "TRACEGAS_NEW_PASSWORD";

    @Override
    public String name() {
        return "user-add";
    }

    @Override
    public String summary() {
        return "add a user with roles (analyst, reviewer, quality-manager, administrator)";
    }

    @Override
    public String usage() {
        return "usage: tracegas user-add <workspace and --as options> --login <login> --name <printed name>\n"
                + "                         --roles <role>[,<role>...]\n" + WorkspaceLogin.USAGE + "\n"
                + "  roles: analyst, reviewer, quality-manager, administrator\n"
                + "  The new user's password is read from $" + NEW_PASSWORD_VARIABLE + ".\n"
                + "exit codes: 0 added, 2 wrong arguments, 5 failure, 6 refused (for example: not an administrator)";
    }

    @Override
    public int run(List<String> arguments, RunnerContext context) throws UsageException {
        Options options = Options.parse(arguments, WorkspaceLogin.optionsWith("--login", "--name", "--roles"));
        Set<Role> roles = roles(options.text("--roles"));
        try (WorkspaceStore store = WorkspaceLogin.open(options, context)) {
            User user = store.users().createUser(WorkspaceLogin.logIn(store, options, context), options.text("--login"),
                    options.text("--name"), roles, WorkspaceLogin.password(context, NEW_PASSWORD_VARIABLE));
            context.out().println("Added " + user.getLogin() + " with roles " + user.getRoles());
            return ExitCode.OK;
        }
    }

    static Set<Role> roles(String text) throws UsageException {
        Set<Role> roles = EnumSet.noneOf(Role.class);
        for (String word : text.split(",")) {
            String name = word.strip().toUpperCase(Locale.ROOT).replace('-', '_');
            try {
                roles.add(Role.valueOf(name));
            } catch (IllegalArgumentException e) {
                throw new UsageException("unknown role '" + word.strip()
                        + "'; roles are analyst, reviewer, quality-manager, administrator");
            }
        }
        return roles;
    }
}
