package org.tracegas.runner.commands;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.tracegas.installation.InstalledSoftware;
import org.tracegas.runner.RunnerContext;
import org.tracegas.runner.UsageException;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;
import org.tracegas.store.Workspaces;

/**
 * How a command opens a workspace and logs in: {@code --workspace <folder>} (embedded H2) or
 * {@code --server <jdbc url> --user <db user> --password <db password>} (PostgreSQL lab server), and
 * {@code --as <login>} with the password in the environment variable {@value #PASSWORD_VARIABLE}, so that it
 * appears neither on the command line nor in the shell history.
 */
final class WorkspaceLogin {

    static final String PASSWORD_VARIABLE = "TRACEGAS_PASSWORD";
    /** The embedded database's file in the workspace's db folder (H2 names it after the database). */
    static final String H2_FILE = "workspace.mv.db";
    static final String USAGE = """
              --workspace <folder>        the workspace on the embedded database, or
              --server <jdbc url> --user <db user> --password <db password>   the lab server
              --as <login>                who acts; the password is read from $TRACEGAS_PASSWORD
              exit code 2 also when the --workspace folder holds no workspace (it is never created here);
              exit code 6: refused (unknown login or wrong password, locked account, or missing role or grant)""";

    private WorkspaceLogin() {
    }

    /** The options of a command acting in a workspace: the workspace and log-in options, then its own. */
    static List<String> optionsWith(String... commandOptions) {
        List<String> all = new ArrayList<>(List.of("--workspace", "--server", "--user", "--password", "--as"));
        all.addAll(List.of(commandOptions));
        return all;
    }

    /**
     * The existing workspace the options name: an embedded folder or the lab server. A command that reads or
     * adds to a workspace never creates one, so a mistyped folder is named instead of becoming an empty
     * workspace.
     *
     * @throws UsageException naming the folder if it holds no workspace
     */
    static WorkspaceStore open(Options options) throws UsageException {
        if (options.has("--workspace") && !options.has("--server")) {
            Path folder = options.path("--workspace");
            if (!Files.isRegularFile(folder.resolve("db").resolve(H2_FILE))) {
                throw new UsageException("no workspace in " + folder + " (it has no db/" + H2_FILE + "); check the "
                        + "folder, or create a workspace there with workspace-init", false);
            }
        }
        return openOrCreate(options);
    }

    /** The workspace the options name, created (schema and all) when it does not exist yet. */
    static WorkspaceStore openOrCreate(Options options) throws UsageException {
        if (options.has("--workspace") == options.has("--server")) {
            throw new UsageException("give either --workspace <folder> or --server <jdbc url>");
        }
        return options.has("--workspace") ? Workspaces.openH2(options.path("--workspace").resolve("db"))
                : Workspaces.openPostgres(options.text("--server"), options.text("--user"),
                        options.text("--password"));
    }

    /**
     * Logs in; then, when this installation's software (its release and add-ons) differs from what the
     * workspace last recorded for it, writes the new state to the audit trail first.
     */
    static Session logIn(WorkspaceStore store, Options options, RunnerContext context) throws UsageException {
        Session session = store.users().logIn(options.text("--as"), password(context, PASSWORD_VARIABLE));
        try {
            InstalledSoftware.running().ifPresent(software -> software.recordIn(store, session));
        } catch (IOException e) {
            throw new UncheckedIOException("recording the installation's software in the audit trail: "
                    + e.getMessage(), e);
        }
        return session;
    }

    static char[] password(RunnerContext context, String variable) throws UsageException {
        String value = context.environment(variable);
        if (value == null || value.isEmpty()) {
            throw new UsageException("set the password in the environment variable " + variable);
        }
        return value.toCharArray();
    }
}
