package org.tracegas.audit;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.Statement;

/**
 * Child process for {@link CrashSafetyTest}: writes business rows, each with its audit record in the same
 * transaction, continuing after the highest row id stored, and prints "committed N" after each commit
 * until it is killed.
 * Arguments: JDBC URL, user, password.
 */
public final class AuditedWriteProcess {

    private AuditedWriteProcess() {
    }

    public static void main(String[] args) throws Exception {
        try (Connection c = TestDatabase.connect(args[0], args[1], args[2])) {
            c.setAutoCommit(false);
            AuditSchema.install(c);
            long first;
            try (Statement s = c.createStatement(); ResultSet rs = s.executeQuery("SELECT COALESCE(MAX(id), 0) FROM sample_result")) {
                rs.next();
                first = rs.getLong(1) + 1;
            }
            try (PreparedStatement insert = c.prepareStatement("INSERT INTO sample_result (id, ppm) VALUES (?, ?)")) {
                for (long id = first; id < first + 1_000_000; id++) {
                    insert.setLong(1, id);
                    insert.setDouble(2, id * 0.5);
                    insert.executeUpdate();
                    AuditTrail.append(c, AuditEntry.builder("writer", AuditAction.CREATE, "sample_result", Long.toString(id))
                            .version(1).newValue("ppm=" + id * 0.5 + "\n").build());
                    c.commit();
                    System.out.println("committed " + id);
                    System.out.flush();
                }
            }
        }
    }
}
