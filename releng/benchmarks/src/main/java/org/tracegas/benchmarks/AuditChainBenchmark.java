package org.tracegas.benchmarks;

import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;

import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.TearDown;
import org.openjdk.jmh.annotations.Warmup;
import org.tracegas.audit.AuditAction;
import org.tracegas.audit.AuditEntry;
import org.tracegas.audit.AuditSchema;
import org.tracegas.audit.AuditTrail;
import org.tracegas.audit.AuditVerifier;
import org.tracegas.audit.VerificationReport;

/**
 * One-off measurement on a long chain (default one million records): {@code append} builds the chain in
 * transactions of 1,000 records in a fresh database; {@code verify} walks a chain of that length built in
 * the setup. Single shot, seconds per chain; records per second = records / score. Database as in
 * {@link AuditBenchmark} ({@code -p db=postgresql}).
 */
@BenchmarkMode(Mode.SingleShotTime)
@OutputTimeUnit(TimeUnit.SECONDS)
@Fork(1)
@Warmup(iterations = 0)
@Measurement(iterations = 1)
public class AuditChainBenchmark {

    private static final int PER_TRANSACTION = 1000;

    /** An empty audit schema, fresh for every iteration. */
    @State(Scope.Thread)
    public static class Empty {
        @Param({"h2"})
        public String db;

        @Param({"1000000"})
        public int records;

        Connection c;
        private String schema;
        private Path dir;

        @Setup(Level.Iteration)
        public void setUp() throws Exception {
            dir = Files.createTempDirectory("audit-chain");
            c = AuditBenchmark.open(db, dir);
            if (db.equals("postgresql")) {
                schema = "audit_chain_" + System.nanoTime();
                try (Statement s = c.createStatement()) {
                    s.execute("CREATE SCHEMA " + schema);
                    s.execute("SET search_path TO " + schema);
                }
            }
            c.setAutoCommit(false);
            AuditSchema.install(c);
        }

        @TearDown(Level.Iteration)
        public void tearDown() throws Exception {
            AuditBenchmark.close(c, schema, dir);
        }
    }

    /** A chain of {@code records} records, built once. */
    @State(Scope.Thread)
    public static class Built extends Empty {
        @Setup(Level.Iteration)
        @Override
        public void setUp() throws Exception {
            super.setUp();
            fill(c, records);
        }
    }

    static void fill(Connection c, int records) throws SQLException {
        List<AuditEntry> batch = new ArrayList<>(PER_TRANSACTION);
        for (int i = 1; i <= records; i++) {
            batch.add(AuditEntry.builder("analyst" + (i % 5), AuditAction.CHANGE, "result", "r" + (i % 1000))
                    .version(i).oldValue("component=CO\nppm=" + (i - 1) * 0.1 + "\n")
                    .newValue("component=CO\nppm=" + i * 0.1 + "\n").build());
            if (batch.size() == PER_TRANSACTION || i == records) {
                AuditTrail.appendAll(c, batch);
                c.commit();
                batch.clear();
            }
        }
    }

    @Benchmark
    public int append(Empty state) throws SQLException {
        fill(state.c, state.records);
        return state.records;
    }

    @Benchmark
    public VerificationReport verify(Built state) throws SQLException {
        VerificationReport report = AuditVerifier.verify(state.c);
        if (!report.intact() || report.recordsChecked() != state.records) {
            throw new IllegalStateException("chain of " + state.records + " records did not verify: " + report.findings());
        }
        return report;
    }
}
