package org.tracegas.runner.commands;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.Statement;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.runner.CommandTable;
import org.tracegas.runner.ExitCode;
import org.tracegas.runner.RunnerContext;
import org.tracegas.store.WorkspaceStore;
import org.tracegas.store.Workspaces;

/** The runner's chain check on a real H2 workspace, before and after a record is tampered with. */
class AuditVerifyCommandTest {

    @TempDir
    Path workspace;

    private final ByteArrayOutputStream out = new ByteArrayOutputStream();

    private int verify(String... more) {
        CommandTable table = new CommandTable("test", List.of(new AuditVerifyCommand()));
        List<String> argv = new java.util.ArrayList<>(List.of("audit-verify", "--workspace", workspace.toString()));
        argv.addAll(List.of(more));
        return table.dispatch(argv.toArray(String[]::new),
                new RunnerContext(new PrintStream(out, true, StandardCharsets.UTF_8), System.err));
    }

    @Test
    void intactChainPassesAndAnAlteredRecordIsNamed() throws Exception {
        try (WorkspaceStore store = Workspaces.openH2(workspace.resolve("db"))) {
            store.users().createFirstAdministrator("admin", "Administrator", "pw-345678".toCharArray());
        }
        assertEquals(ExitCode.OK, verify());
        assertTrue(out.toString(StandardCharsets.UTF_8).contains("Chain and data intact."));

        // an attacker with database access: drop the refusal triggers, then change a stored record
        org.h2.Driver.load();
        try (Connection c = DriverManager.getConnection("jdbc:h2:file:" + workspace.resolve("db").resolve("workspace"));
                Statement s = c.createStatement()) {
            s.execute("DROP TRIGGER IF EXISTS audit_record_append_only");
            s.execute("UPDATE audit_record SET user_id = 'someone-else'");
        }
        out.reset();
        assertEquals(ExitCode.CHECK_FAILED, verify());
        String text = out.toString(StandardCharsets.UTF_8);
        assertTrue(text.contains("ALTERED") && text.contains("TAMPERING FOUND"), text);
    }

    @Test
    void aChangedUserRowIsNamedAndAMissedAnchorIsReported() throws Exception {
        String userId;
        try (WorkspaceStore store = Workspaces.openH2(workspace.resolve("db"))) {
            userId = store.users().createFirstAdministrator("admin", "Administrator", "pw-345678".toCharArray())
                    .userId();
        }
        assertEquals(ExitCode.OK, verify());
        String anchor = out.toString(StandardCharsets.UTF_8).lines().filter(l -> l.startsWith("Chain anchor: "))
                .findFirst().orElseThrow().substring("Chain anchor: ".length());
        assertEquals(ExitCode.OK, verify("--anchor", anchor));
        assertEquals(ExitCode.CHECK_FAILED, verify("--anchor", anchor.replaceFirst(":.", ":f").equals(anchor)
                ? anchor.replaceFirst(":.", ":e") : anchor.replaceFirst(":.", ":f")), "a hash the chain never had");

        org.h2.Driver.load();
        try (Connection c = DriverManager.getConnection("jdbc:h2:file:" + workspace.resolve("db").resolve("workspace"));
                Statement s = c.createStatement()) {
            s.execute("UPDATE app_user SET roles = 'ADMINISTRATOR,QUALITY_MANAGER'");
        }
        out.reset();
        assertEquals(ExitCode.CHECK_FAILED, verify());
        String text = out.toString(StandardCharsets.UTF_8);
        assertTrue(text.contains("CHANGED user " + userId + ", vouched for by audit record 1"), text);
    }

    @Test
    void aMalformedAnchorsFileIsNamedWithItsLine() throws Exception {
        Path file = workspace.resolve("anchors.txt");
        java.nio.file.Files.writeString(file, "# anchors of our reports\n\n12:not-a-hash\n");
        assertEquals(ExitCode.BAD_INPUT, verify("--anchors", file.toString()));
    }
}
