package org.tracegas.audit.internal;

import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Properties;
import java.util.stream.Stream;

import org.tracegas.audit.AuditAction;
import org.tracegas.audit.AuditEntry;
import org.tracegas.audit.AuditSchema;
import org.tracegas.audit.AuditTrail;

/**
 * Runs inside a class loader that H2's own loader cannot see, as in an OSGi framework, for
 * {@link H2TriggerClassesTest}. Returns what happened, one line per step.
 */
public final class IsolatedH2Scenario {

    private IsolatedH2Scenario() {
    }

    public static List<String> run() throws Exception {
        List<String> steps = new ArrayList<>();
        Properties p = new Properties();
        p.setProperty("user", "sa");
        p.setProperty("password", "");
        Path dir = Files.createTempDirectory("audit-isolated");
        String url = "jdbc:h2:file:" + dir.resolve("a");
        try (Connection c = new org.h2.Driver().connect(url, p); Statement s = c.createStatement()) {
            s.execute("CREATE TABLE t (x INT)");
            try {
                s.execute("CREATE TRIGGER t_refuse BEFORE DELETE ON t FOR EACH ROW CALL '"
                        + H2AppendOnlyTrigger.class.getName() + "'");
                steps.add("unregistered trigger class loaded");
            } catch (SQLException e) {
                steps.add("unregistered trigger class not found");
            }
            c.setAutoCommit(false);
            AuditSchema.install(c);
            AuditTrail.append(c, AuditEntry.builder("alice", AuditAction.CREATE, "result", "r1").build());
            c.commit();
            try {
                s.executeUpdate("DELETE FROM audit_record");
                steps.add("delete allowed");
            } catch (SQLException e) {
                steps.add(e.getMessage().contains("append-only") ? "delete refused by the trigger" : e.getMessage());
            }
            s.execute("SHUTDOWN");
        }
        try (Stream<Path> files = Files.walk(dir)) {
            files.sorted(Comparator.reverseOrder()).forEach(f -> f.toFile().delete());
        }
        return steps;
    }
}
