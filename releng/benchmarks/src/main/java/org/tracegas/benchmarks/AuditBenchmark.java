package org.tracegas.benchmarks;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.Driver;
import java.sql.PreparedStatement;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.OffsetDateTime;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Properties;
import java.util.UUID;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;

import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OperationsPerInvocation;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.TearDown;
import org.tracegas.audit.AuditAction;
import org.tracegas.audit.AuditEntry;
import org.tracegas.audit.AuditRecord;
import org.tracegas.audit.AuditSchema;
import org.tracegas.audit.AuditTrail;

/**
 * Cost of the hash chain: appending audit records (row lock on the chain head, database clock, SHA-256,
 * insert, head update) against a plain INSERT of the same row into a table of the same shape and indexes
 * without chaining, in the same run. Batches of 100 records per transaction, and single records per
 * transaction. Scores are microseconds per record. Database: H2 file (default) or PostgreSQL
 * ({@code -p db=postgresql}; URL, user, password from tracegas.test.pg.url/.user/.password).
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
public class AuditBenchmark {

    private static final int BATCH = 100;

    @Param({"h2"})
    public String db;

    private Path dir;
    private String schema;
    private Connection c;
    private PreparedStatement plain;
    private long plainSeq;
    private int row;

    @Setup
    public void setUp() throws Exception {
        dir = Files.createTempDirectory("audit-bench");
        c = open(db, dir);
        if (db.equals("postgresql")) {
            schema = "audit_bench_" + UUID.randomUUID().toString().replace("-", "").substring(0, 12);
            try (Statement s = c.createStatement()) {
                s.execute("CREATE SCHEMA " + schema);
                s.execute("SET search_path TO " + schema);
            }
        }
        c.setAutoCommit(false);
        AuditSchema.install(c);
        try (Statement s = c.createStatement()) {
            // same columns, keys and indexes as audit_record
            s.execute("CREATE TABLE plain_record (seq BIGINT PRIMARY KEY, record_id VARCHAR(36) NOT NULL,"
                    + " recorded_at TIMESTAMP(6) WITH TIME ZONE NOT NULL, user_id VARCHAR(200) NOT NULL,"
                    + " action VARCHAR(32) NOT NULL, object_type VARCHAR(200) NOT NULL, object_id VARCHAR(400) NOT NULL,"
                    + " object_version BIGINT NOT NULL, old_value VARCHAR(100000), new_value VARCHAR(100000),"
                    + " reason VARCHAR(100000), signer_name VARCHAR(400), meaning VARCHAR(32), content_sha256 CHAR(64),"
                    + " prev_hash CHAR(64) NOT NULL, hash CHAR(64) NOT NULL)");
            s.execute("CREATE INDEX plain_record_object ON plain_record (object_type, object_id)");
            s.execute("CREATE INDEX plain_record_time ON plain_record (recorded_at)");
        }
        c.commit();
        plain = c.prepareStatement("INSERT INTO plain_record (seq, record_id, recorded_at, user_id, action, object_type,"
                + " object_id, object_version, old_value, new_value, reason, prev_hash, hash)"
                + " VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)");
    }

    /** A connection to PostgreSQL, or to a new H2 file database in {@code dir}. */
    static Connection open(String db, Path dir) throws SQLException {
        Properties p = new Properties();
        if (db.equals("postgresql")) {
            p.setProperty("user", System.getProperty("tracegas.test.pg.user", "tracegas"));
            p.setProperty("password", System.getProperty("tracegas.test.pg.password", "tracegas"));
            return new org.postgresql.Driver().connect(
                    System.getProperty("tracegas.test.pg.url", "jdbc:postgresql://127.0.0.1:55432/tracegas"), p);
        }
        p.setProperty("user", "sa");
        p.setProperty("password", "");
        Driver h2 = new org.h2.Driver();
        return h2.connect("jdbc:h2:file:" + dir.resolve("audit") + ";WRITE_DELAY=0", p);
    }

    @TearDown
    public void tearDown() throws Exception {
        close(c, schema, dir);
    }

    /** Drops the PostgreSQL schema, or shuts H2 down; then deletes {@code dir}. */
    static void close(Connection c, String schema, Path dir) throws SQLException, IOException {
        try (Statement s = c.createStatement()) {
            s.execute(schema == null ? "SHUTDOWN" : "DROP SCHEMA " + schema + " CASCADE");
            if (schema != null) {
                c.commit();
            }
        }
        c.close();
        try (Stream<Path> files = Files.walk(dir)) {
            files.sorted(Comparator.reverseOrder()).forEach(f -> f.toFile().delete());
        }
    }

    private AuditEntry entry() {
        row++;
        return AuditEntry.builder("analyst" + (row % 5), AuditAction.CHANGE, "result", "r" + (row % 1000))
                .version(row).oldValue("component=CO\nppm=" + (row - 1) * 0.1 + "\n")
                .newValue("component=CO\nppm=" + row * 0.1 + "\n").build();
    }

    @Benchmark
    @OperationsPerInvocation(BATCH)
    public List<AuditRecord> appendBatch() throws SQLException {
        List<AuditEntry> entries = new ArrayList<>(BATCH);
        for (int i = 0; i < BATCH; i++) {
            entries.add(entry());
        }
        List<AuditRecord> stored = AuditTrail.appendAll(c, entries);
        c.commit();
        return stored;
    }

    @Benchmark
    @OperationsPerInvocation(BATCH)
    public int plainInsertBatch() throws SQLException {
        for (int i = 0; i < BATCH; i++) {
            bindPlain(entry());
            plain.addBatch();
        }
        int n = plain.executeBatch().length;
        c.commit();
        return n;
    }

    @Benchmark
    public AuditRecord appendSingle() throws SQLException {
        AuditRecord stored = AuditTrail.append(c, entry());
        c.commit();
        return stored;
    }

    @Benchmark
    public int plainInsertSingle() throws SQLException {
        bindPlain(entry());
        int n = plain.executeUpdate();
        c.commit();
        return n;
    }

    private void bindPlain(AuditEntry e) throws SQLException {
        String id = UUID.randomUUID().toString();
        plain.setLong(1, ++plainSeq);
        plain.setString(2, id);
        plain.setObject(3, OffsetDateTime.now(ZoneOffset.UTC));
        plain.setString(4, e.userId());
        plain.setString(5, e.action().name());
        plain.setString(6, e.objectType());
        plain.setString(7, e.objectId());
        plain.setLong(8, e.objectVersion());
        plain.setString(9, e.oldValue());
        plain.setString(10, e.newValue());
        plain.setString(11, e.reason());
        plain.setString(12, "0".repeat(64));
        plain.setString(13, (id + UUID.randomUUID()).replace("-", ""));
    }
}
