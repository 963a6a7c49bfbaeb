package org.tracegas.runner.commands;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermission;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.Set;
import java.util.List;

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
    static final String USAGE = """
              --workspace <folder>        the workspace on the embedded database, or
              --server <jdbc url> --user <db user>   the lab server; its password from $TRACEGAS_DB_PASSWORD
                                          or the owner-only file named by $TRACEGAS_DB_PASSWORD_FILE
              --as <login>                who acts; the password is read from $TRACEGAS_PASSWORD""";

    private WorkspaceLogin() {
    }

    /** The options of a command acting in a workspace: the workspace and log-in options, then its own. */
    static List<String> optionsWith(String... commandOptions) {
        List<String> all = new ArrayList<>(List.of("--workspace", "--server", "--user", "--as"));
        all.addAll(List.of(commandOptions));
        return all;
    }

    /** The workspace the options name: an embedded folder or the lab server. */
    static WorkspaceStore open(Options options, RunnerContext context) throws UsageException {
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

    static Session logIn(WorkspaceStore store, Options options, RunnerContext context) throws UsageException {
        return store.users().logIn(options.text("--as"), password(context, PASSWORD_VARIABLE));
    }

    static char[] password(RunnerContext context, String variable) throws UsageException {
        String value = context.environment(variable);
        if (value == null || value.isEmpty()) {
            throw new UsageException("set the password in the environment variable " + variable);
        }
        return value.toCharArray();
    }
}
