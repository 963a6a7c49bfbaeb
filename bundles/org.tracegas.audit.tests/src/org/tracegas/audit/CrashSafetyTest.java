package org.tracegas.audit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.File;
import java.io.InputStreamReader;
import java.net.URISyntaxException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.ResultSet;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import java.util.concurrent.TimeUnit;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * A child JVM writes audited business rows and is killed with SIGKILL mid-batch. Afterwards the chain
 * verifies, every business row has its audit record and every audit record its business row, and every
 * commit the child reported is present.
 */
class CrashSafetyTest {

    static List<String> kinds() {
        return TestDatabase.kinds();
    }

    @ParameterizedTest
    @MethodSource("kinds")
    void killedWriterLeavesAConsistentChain(String kind) throws Exception {
        try (TestDatabase db = TestDatabase.create(kind)) {
            try (Connection c = db.openInstalled(); Statement s = c.createStatement()) {
                s.execute("CREATE TABLE sample_result (id BIGINT PRIMARY KEY, ppm DOUBLE PRECISION NOT NULL)");
                c.commit();
                if (kind.equals("h2")) {
                    s.execute("SHUTDOWN"); // the child process opens the file database alone
                }
            }
            for (int round = 0; round < 3; round++) {
                long acknowledged = runAndKill(db, 150 + 100 * round);
                try (Connection c = db.openInstalled()) {
                    VerificationReport report = AuditVerifier.verify(c);
                    assertTrue(report.intact(), report.findings().toString());
                    Set<Long> rows = ids(c, "SELECT id FROM sample_result");
                    Set<Long> audited = ids(c, "SELECT CAST(object_id AS BIGINT) FROM audit_record WHERE object_type = 'sample_result'");
                    assertEquals(rows, audited, "business rows and audit records match one to one");
                    assertEquals(report.recordsChecked(), rows.size());
                    assertTrue(rows.size() >= acknowledged, rows.size() + " rows, " + acknowledged + " commits reported");
                    if (kind.equals("h2")) {
                        try (Statement s = c.createStatement()) {
                            s.execute("SHUTDOWN");
                        }
                    }
                }
            }
        }
    }

    /** Starts the writer, waits until it reported {@code commits} more commits, kills it; returns its last count. */
    private static long runAndKill(TestDatabase db, int commits) throws Exception {
        List<String> command = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-cp", childClassPath(), AuditedWriteProcess.class.getName()));
        command.addAll(db.connectionArguments());
        Process p = new ProcessBuilder(command).redirectError(ProcessBuilder.Redirect.INHERIT).start();
        long last = 0;
        int seen = 0;
        try (BufferedReader out = new BufferedReader(new InputStreamReader(p.getInputStream(), StandardCharsets.UTF_8))) {
            String line;
            while (seen < commits && (line = out.readLine()) != null) {
                last = Long.parseLong(line.substring("committed ".length()));
                seen++;
            }
            // SIGKILL on Linux: no shutdown hooks, no orderly close; through the handle, which (unlike
            // Process.destroyForcibly) leaves the pipe open for the lines already written
            p.toHandle().destroyForcibly();
            assertTrue(p.waitFor(30, TimeUnit.SECONDS));
            // lines the child printed before it died are commits too
            while ((line = out.readLine()) != null) {
                last = Long.parseLong(line.substring("committed ".length()));
            }
        }
        assertEquals(commits, seen, "the writer reported as many commits as awaited before it was killed");
        return last;
    }

    /*
     * Built from the code-source locations of the classes the child needs: under an OSGi test runtime the
     * java.class.path is only the launcher.
     */
    private static String childClassPath() throws URISyntaxException {
        Set<String> entries = new LinkedHashSet<>();
        for (Class<?> k : List.of(AuditedWriteProcess.class, AuditTrail.class, org.h2.Driver.class, org.postgresql.Driver.class)) {
            entries.add(Path.of(k.getProtectionDomain().getCodeSource().getLocation().toURI()).toString());
        }
        return String.join(File.pathSeparator, entries);
    }

    private static Set<Long> ids(Connection c, String sql) throws Exception {
        Set<Long> ids = new TreeSet<>();
        try (Statement s = c.createStatement(); ResultSet rs = s.executeQuery(sql)) {
            while (rs.next()) {
                ids.add(rs.getLong(1));
            }
        }
        return ids;
    }
}
