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

    private int verify() {
        CommandTable table = new CommandTable("test", List.of(new AuditVerifyCommand()));
        return table.dispatch(new String[] { "audit-verify", "--workspace", workspace.toString() },
                new RunnerContext(new PrintStream(out, true, StandardCharsets.UTF_8), System.err));
    }

    @Test
    void intactChainPassesAndAnAlteredRecordIsNamed() throws Exception {
        try (WorkspaceStore store = Workspaces.openH2(workspace.resolve("db"))) {
            store.users().createFirstAdministrator("admin", "Administrator", "pw-345678".toCharArray());
        }
        assertEquals(ExitCode.OK, verify());
        assertTrue(out.toString(StandardCharsets.UTF_8).contains("Chain intact."));

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
        assertTrue(text.contains("ALTERED") && text.contains("CHAIN BROKEN"), text);
    }
}
