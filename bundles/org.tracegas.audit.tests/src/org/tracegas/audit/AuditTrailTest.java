package org.tracegas.audit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.tracegas.audit.internal.ChainHash;

class AuditTrailTest {

    static List<String> kinds() {
        return TestDatabase.kinds();
    }

    static AuditEntry change(String user, String id, int version) {
        return AuditEntry.builder(user, AuditAction.CHANGE, "result", id).version(version)
                .oldValue("ppm=" + (version - 1) + "\n").newValue("ppm=" + version + "\n").build();
    }

    @ParameterizedTest
    @MethodSource("kinds")
    void appendsChainedRecordsWithDatabaseTime(String kind) throws Exception {
        try (TestDatabase db = TestDatabase.create(kind); Connection c = db.openInstalled()) {
            AuditSchema.install(c); // idempotent: a second install changes nothing
            Instant before = Instant.now().minusSeconds(5);
            AuditRecord first = AuditTrail.append(c, change("alice", "r1", 1));
            AuditRecord second = AuditTrail.append(c, change("bob", "r1", 2));
            c.commit();
            assertEquals(1, first.sequence());
            assertEquals(2, second.sequence());
            assertEquals(ChainHash.GENESIS, first.previousHash());
            assertEquals(first.hash(), second.previousHash(), "hash chain: record 2 names record 1's hash");
            // database clock, same host: within a few seconds of this JVM's clock (common practice, no source)
            assertTrue(Duration.between(before, first.recordedAt()).abs().getSeconds() < 60, first.recordedAt().toString());
            List<AuditRecord> stored = AuditReview.review(c, AuditQuery.all().build()).records();
            assertEquals(List.of(first, second), stored, "what is read back equals what was appended");
            assertTrue(AuditVerifier.verify(c).intact());
        }
    }

    @ParameterizedTest
    @MethodSource("kinds")
    void databaseRefusesUpdateDeleteAndTruncate(String kind) throws Exception {
        try (TestDatabase db = TestDatabase.create(kind); Connection c = db.openInstalled()) {
            AuditTrail.append(c, change("alice", "r1", 1));
            c.commit();
            for (String sql : List.of("UPDATE audit_record SET user_id = 'mallory'", "DELETE FROM audit_record",
                    "TRUNCATE TABLE audit_record", "DELETE FROM audit_chain_head", "TRUNCATE TABLE audit_chain_head",
                    "UPDATE audit_chain_head SET last_seq = 0")) {
                try (Statement s = c.createStatement()) {
                    SQLException e = assertThrows(SQLException.class, () -> s.executeUpdate(sql), sql);
                    assertTrue(e.getMessage().contains("audit"), e.getMessage());
                }
                c.rollback();
            }
            try (Statement s = c.createStatement(); ResultSet rs = s.executeQuery("SELECT user_id FROM audit_record")) {
                assertTrue(rs.next());
                assertEquals("alice", rs.getString(1));
            }
            assertTrue(AuditVerifier.verify(c).intact());
        }
    }

    @ParameterizedTest
    @MethodSource("kinds")
    void rolledBackBusinessChangeLeavesNoRecord(String kind) throws Exception {
        try (TestDatabase db = TestDatabase.create(kind); Connection c = db.openInstalled()) {
            AuditTrail.append(c, change("alice", "r1", 1));
            c.rollback();
            AuditRecord kept = AuditTrail.append(c, change("alice", "r1", 1));
            c.commit();
            assertEquals(1, kept.sequence(), "the rolled-back append released its sequence number");
            assertTrue(AuditVerifier.verify(c).intact());
        }
    }

    @ParameterizedTest
    @MethodSource("kinds")
    void refusesAutoCommitConnection(String kind) throws Exception {
        try (TestDatabase db = TestDatabase.create(kind); Connection c = db.openInstalled()) {
            c.setAutoCommit(true);
            IllegalStateException e = assertThrows(IllegalStateException.class,
                    () -> AuditTrail.append(c, change("alice", "r1", 1)));
            assertTrue(e.getMessage().contains("auto-commit"), e.getMessage());
        }
    }

    @ParameterizedTest
    @MethodSource("kinds")
    void concurrentAppendersDoNotForkTheChain(String kind) throws Exception {
        int threads = 8;
        int perThread = 40;
        try (TestDatabase db = TestDatabase.create(kind)) {
            try (Connection c = db.openInstalled()) {
                c.commit();
            }
            ExecutorService pool = Executors.newFixedThreadPool(threads);
            try {
                List<Future<Void>> done = new ArrayList<>();
                for (int t = 0; t < threads; t++) {
                    String user = "user" + t;
                    done.add(pool.submit(() -> {
                        try (Connection c = db.open()) {
                            for (int i = 0; i < perThread; i++) {
                                AuditTrail.append(c, change(user, "r" + i, i + 1));
                                if (i % 3 == 0) {
                                    AuditTrail.appendAll(c, List.of(change(user, "s" + i, 1), change(user, "s" + i, 2)));
                                }
                                c.commit();
                            }
                        }
                        return null;
                    }));
                }
                for (Future<Void> f : done) {
                    f.get();
                }
            } finally {
                pool.shutdown();
            }
            try (Connection c = db.open()) {
                VerificationReport report = AuditVerifier.verify(c);
                long expected = threads * (perThread + 2L * ((perThread + 2) / 3));
                assertTrue(report.intact(), report.findings().toString());
                assertEquals(expected, report.recordsChecked());
                assertEquals(expected, report.headSequence());
                try (PreparedStatement q = c.prepareStatement("SELECT COUNT(DISTINCT prev_hash) FROM audit_record");
                        ResultSet rs = q.executeQuery()) {
                    rs.next();
                    assertEquals(expected, rs.getLong(1), "no two records share a predecessor: the chain did not fork");
                }
            }
        }
    }

    @ParameterizedTest
    @MethodSource("kinds")
    void verifierReportsAnEmptyChainIntact(String kind) throws Exception {
        try (TestDatabase db = TestDatabase.create(kind); Connection c = db.openInstalled()) {
            VerificationReport report = AuditVerifier.verify(c);
            assertTrue(report.intact());
            assertEquals(0, report.recordsChecked());
            assertFalse(report.truncated());
        }
    }
}
