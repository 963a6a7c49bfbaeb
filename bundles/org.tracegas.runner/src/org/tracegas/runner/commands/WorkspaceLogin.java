package org.tracegas.runner.commands;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermission;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.Set;
import java.util.List;

import org.tracegas.installation.InstalledSoftware;
import org.tracegas.runner.RunnerContext;
import org.tracegas.runner.UsageException;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;
import org.tracegas.store.Workspaces;

/**
 * How a command opens a workspace and logs in: {@code --workspace <folder>} (embedded H2) or
 * {@code --server <jdbc url> --user <db user>} (PostgreSQL lab server) with the database password in the
 * environment variable {@value #SERVER_PASSWORD_VARIABLE} or in a file readable by its owner only, named by
 * {@value #SERVER_PASSWORD_FILE_VARIABLE}; and {@code --as <login>} with the password in the environment variable
 * {@value #PASSWORD_VARIABLE}. No password appears on the command line (where every user of the machine can read
 * it in the process list) or in the shell history.
 */
final class WorkspaceLogin {

    static final String PASSWORD_VARIABLE = "TRACEGAS_PASSWORD";
    static final String SERVER_PASSWORD_VARIABLE = "TRACEGAS_DB_PASSWORD";
    static final String SERVER_PASSWORD_FILE_VARIABLE = "TRACEGAS_DB_PASSWORD_FILE";
    static final String SERVER_PASSWORD_RULE = "$" + SERVER_PASSWORD_VARIABLE + " or the owner-only file named by $"
            + SERVER_PASSWORD_FILE_VARIABLE;
    /** The embedded database's file in the workspace's db folder (H2 names it after the database). */
    static final String H2_FILE = "workspace.mv.db";
    static final String USAGE = """
              --workspace <folder>        the workspace on the embedded database, or
              --server <jdbc url> --user <db user>   the lab server; its password from $TRACEGAS_DB_PASSWORD
                                          or the owner-only file named by $TRACEGAS_DB_PASSWORD_FILE
              --as <login>                who acts; the password is read from $TRACEGAS_PASSWORD
              exit code 2 also when the --workspace folder holds no workspace (it is never created here);
              exit code 6: refused (unknown login or wrong password, locked account, or missing role or grant)""";

    private WorkspaceLogin() {
    }

    /** The options of a command acting in a workspace: the workspace and log-in options, then its own. */
    static List<String> optionsWith(String... commandOptions) {
        List<String> all = new ArrayList<>(List.of("--workspace", "--server", "--user", "--as"));
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
    static WorkspaceStore open(Options options, RunnerContext context) throws UsageException {
        if (options.has("--workspace") && !options.has("--server")) {
            Path folder = options.path("--workspace");
            if (!Files.isRegularFile(folder.resolve("db").resolve(H2_FILE))) {
                throw new UsageException("no workspace in " + folder + " (it has no db/" + H2_FILE + "); check the "
                        + "folder, or create a workspace there with workspace-init", false);
            }
        }
        return openOrCreate(options, context);
    }

    /** The workspace the options name, created (schema and all) when it does not exist yet. */
    static WorkspaceStore openOrCreate(Options options, RunnerContext context) throws UsageException {
        if (options.has("--workspace") == options.has("--server")) {
            throw new UsageException("give either --workspace <folder> or --server <jdbc url>");
        }
        return options.has("--workspace") ? Workspaces.openH2(options.path("--workspace").resolve("db"))
                : Workspaces.openPostgres(options.text("--server"), options.text("--user"),
                        new String(serverPassword(context)));
    }

    /** The lab server's password: from the environment, or from a file only its owner may read. */
    static char[] serverPassword(RunnerContext context) throws UsageException {
        String value = context.environment(SERVER_PASSWORD_VARIABLE);
        if (value != null && !value.isEmpty()) {
            return value.toCharArray();
        }
        String fileName = context.environment(SERVER_PASSWORD_FILE_VARIABLE);
        if (fileName == null || fileName.isEmpty()) {
            throw new UsageException("set the lab server's password in " + SERVER_PASSWORD_RULE.replace("$", ""));
        }
        Path file = Path.of(fileName);
        try {
            if (Files.getFileStore(file).supportsFileAttributeView("posix")) {
                Set<PosixFilePermission> p = Files.getPosixFilePermissions(file);
                p.retainAll(EnumSet.of(PosixFilePermission.GROUP_READ, PosixFilePermission.GROUP_WRITE,
                        PosixFilePermission.OTHERS_READ, PosixFilePermission.OTHERS_WRITE));
                if (!p.isEmpty()) {
                    throw new UsageException(file + ": others than its owner may read or write this password file ("
                            + p + "); chmod 600 it");
                }
            }
            String first = Files.readAllLines(file, StandardCharsets.UTF_8).stream().findFirst().orElse("").strip();
            if (first.isEmpty()) {
                throw new UsageException(file + ", line 1: the password file is empty");
            }
            return first.toCharArray();
        } catch (IOException e) {
            throw new UsageException(file + ": the password file cannot be read: " + e.getMessage());
        }
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
