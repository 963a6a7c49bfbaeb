package org.tracegas.audit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Several connections append at once, single records and batches, some of them after serving a
 * repeatable-read verification and still in that isolation level; the stored chain must be one unbroken line
 * (checked in SQL, apart from the verifier), and the verifier, run many times over the untouched chain, must
 * find it intact every time.
 */
class ConcurrentAppendTest {

    private static final int THREADS = 4;
    private static final int TRANSACTIONS_PER_THREAD = 20;
    private static final int RECORDS_PER_TRANSACTION = 25;
    /**
     * Walks of the finished chain: enough rows walked (some 10^5 and more) for the JIT to compile the walk, so
     * the compiled walk is checked as well as the interpreted one.
     */
    private static final int WALKS = 400;

    @ParameterizedTest
    @MethodSource("org.tracegas.audit.TestDatabase#kinds")
    void concurrentAppendersBuildOneUnbrokenChainThatVerifiesIntactEveryTime(String kind) throws Exception {
        try (TestDatabase db = TestDatabase.create(kind)) {
            try (Connection c = db.openInstalled()) {
                c.commit();
            }
            AtomicInteger retries = new AtomicInteger();
            ExecutorService pool = Executors.newFixedThreadPool(THREADS);
            try {
                List<Future<Void>> done = new ArrayList<>();
                for (int t = 0; t < THREADS; t++) {
                    int thread = t;
                    done.add(pool.submit(() -> {
                        appendAll(db, thread, thread % 2 == 0, retries);
                        return null;
                    }));
                }
                for (Future<Void> f : done) {
                    f.get(5, TimeUnit.MINUTES);
                }
            } finally {
                pool.shutdownNow();
            }
            long expected = (long) THREADS * TRANSACTIONS_PER_THREAD * RECORDS_PER_TRANSACTION;
            try (Connection c = db.open()) {
                assertEquals(List.of(), brokenLinks(c), "links checked in SQL, apart from the verifier");
                for (int walk = 0; walk < WALKS; walk++) {
                    VerificationReport report = AuditVerifier.verify(c);
                    c.commit();
                    assertEquals(expected, report.recordsChecked());
                    assertTrue(report.intact(), "walk " + walk + " of the untouched chain: " + report.findings());
                }
            }
            System.out.println(getClass().getSimpleName() + " on " + kind + ": " + expected + " records, "
                    + retries + " transactions retried after a serialization failure, " + WALKS + " walks intact");
        }
    }

    /**
     * One appender's transactions, alternately one batch and single appends; a repeatable-read appender first
     * verifies the chain in its transaction. A transaction refused for a concurrent update (SQLSTATE 40001,
     * serialization failure, SQL standard) is rolled back and run again, as a caller at that isolation level must.
     */
    private static void appendAll(TestDatabase db, int thread, boolean repeatableRead, AtomicInteger retries)
            throws SQLException {
        try (Connection c = db.open()) {
            for (int tx = 0; tx < TRANSACTIONS_PER_THREAD; tx++) {
                while (true) {
                    try {
                        if (repeatableRead) {
                            c.setTransactionIsolation(Connection.TRANSACTION_REPEATABLE_READ);
                            AuditVerifier.verify(c);
                        }
                        List<AuditEntry> entries = new ArrayList<>();
                        for (int i = 0; i < RECORDS_PER_TRANSACTION; i++) {
                            entries.add(AuditTrailTest.change("analyst" + thread, "r" + thread + "-" + tx, i + 1));
                        }
                        if (tx % 2 == 0) {
                            AuditTrail.appendAll(c, entries);
                        } else {
                            for (AuditEntry e : entries) {
                                AuditTrail.append(c, e);
                            }
                        }
                        c.commit();
                        break;
                    } catch (SQLException e) {
                        c.rollback();
                        if (!"40001".equals(e.getSQLState())) {
                            throw e;
                        }
                        retries.incrementAndGet();
                    }
                }
            }
        }
    }

    /** Records whose stored previous hash is not the stored hash of the record before them, or that share it. */
    private static List<String> brokenLinks(Connection c) throws SQLException {
        List<String> broken = new ArrayList<>();
        try (PreparedStatement q = c.prepareStatement("SELECT r.seq, r.prev_hash, p.hash FROM audit_record r"
                + " LEFT JOIN audit_record p ON p.seq = r.seq - 1 WHERE p.hash IS NULL AND r.seq <> 1"
                + " OR r.prev_hash <> COALESCE(p.hash, '" + "0".repeat(64) + "') ORDER BY r.seq");
                ResultSet rs = q.executeQuery()) {
            while (rs.next()) {
                broken.add(rs.getLong(1) + ": links to " + rs.getString(2) + ", predecessor is " + rs.getString(3));
            }
        }
        try (PreparedStatement q = c.prepareStatement(
                "SELECT prev_hash, COUNT(*) FROM audit_record GROUP BY prev_hash HAVING COUNT(*) > 1");
                ResultSet rs = q.executeQuery()) {
            while (rs.next()) {
                broken.add(rs.getLong(2) + " records link to " + rs.getString(1));
            }
        }
        c.commit();
        return broken;
    }
}
