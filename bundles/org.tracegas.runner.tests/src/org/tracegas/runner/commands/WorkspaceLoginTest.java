package org.tracegas.runner.commands;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.runner.RunnerContext;
import org.tracegas.runner.UsageException;

/** Where the lab server's password comes from: never the command line. */
class WorkspaceLoginTest {

    @TempDir
    Path folder;

    private static RunnerContext with(Map<String, String> env) {
        PrintStream sink = new PrintStream(new ByteArrayOutputStream(), true, StandardCharsets.UTF_8);
        return new RunnerContext(sink, sink, env);
    }

    @Test
    void theEnvironmentVariableOrAnOwnerOnlyFileGivesThePassword() throws Exception {
        assertArrayEquals("s3cret-env".toCharArray(),
                WorkspaceLogin.serverPassword(with(Map.of("TRACEGAS_DB_PASSWORD", "s3cret-env"))));
        Path file = folder.resolve("db-password");
        Files.writeString(file, "s3cret-file\n");
        Files.setPosixFilePermissions(file, PosixFilePermissions.fromString("rw-------"));
        assertArrayEquals("s3cret-file".toCharArray(),
                WorkspaceLogin.serverPassword(with(Map.of("TRACEGAS_DB_PASSWORD_FILE", file.toString()))));
    }

    @Test
    void aFileOthersMayReadIsRefusedNamingIt() throws Exception {
        Path file = folder.resolve("db-password");
        Files.writeString(file, "s3cret-file\n");
        Files.setPosixFilePermissions(file, PosixFilePermissions.fromString("rw-r--r--"));
        UsageException e = assertThrows(UsageException.class,
                () -> WorkspaceLogin.serverPassword(with(Map.of("TRACEGAS_DB_PASSWORD_FILE", file.toString()))));
        assertTrue(e.getMessage().startsWith(file + ": others than its owner") && e.getMessage().contains("chmod 600"),
                e.getMessage());
    }

    @Test
    void withoutEitherTheMessageSaysWhereToPutIt() {
        UsageException e = assertThrows(UsageException.class, () -> WorkspaceLogin.serverPassword(with(Map.of())));
        assertTrue(e.getMessage().contains("TRACEGAS_DB_PASSWORD"), e.getMessage());
    }

    @Test
    void theCommandLineOptionIsGone() {
        UsageException e = assertThrows(UsageException.class, () -> Options.parse(java.util.List.of("--server",
                "jdbc:postgresql://127.0.0.1/x", "--password", "p"), WorkspaceLogin.optionsWith()));
        assertTrue(e.getMessage().startsWith("unknown option '--password'"), e.getMessage());
    }
}
