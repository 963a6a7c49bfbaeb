package org.tracegas.audit.internal;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.time.Instant;
import java.time.OffsetDateTime;
import java.util.ArrayList;
import java.util.List;
import java.util.UUID;

import org.tracegas.audit.AuditEntry;
import org.tracegas.audit.AuditRecord;
import org.tracegas.audit.SignatureMeaning;

/**
 * Appends records to the chain inside the caller's transaction. Appenders are serialised by a row lock
 * on the single chain-head row (SELECT ... FOR UPDATE), held until the caller commits or rolls back, so
 * two transactions can never extend the chain from the same predecessor.
 */
public final class ChainWriter {

    /** Signature fields of a record; all null for records that are not signatures. */
    public record SignatureFields(String signerName, SignatureMeaning meaning, String contentSha256) {
        public static final SignatureFields NONE = new SignatureFields(null, null, null);
    }

    /** An entry waiting to be appended. */
    public record Pending(AuditEntry entry, SignatureFields signature) {
    }

    private ChainWriter() {
    }

    /**
     * Appends the entries in order and returns the stored records.
     *
     * @throws IllegalStateException when {@code c} is in auto-commit mode (the lock would end at once)
     * @throws SQLException          from the database, e.g. a lock timeout
     */
    public static List<AuditRecord> append(Connection c, List<Pending> pending) throws SQLException {
        if (c.getAutoCommit()) {
            throw new IllegalStateException("connection: auto-commit is on; audit records must be appended"
                    + " inside the caller's transaction");
        }
        if (pending.isEmpty()) {
            return List.of();
        }
        Dialect dialect = Dialect.of(c);
        long seq;
        String prev;
        try (PreparedStatement lock = c.prepareStatement(
                "SELECT last_seq, last_hash FROM audit_chain_head WHERE id = 1 FOR UPDATE");
                ResultSet rs = lock.executeQuery()) {
            if (!rs.next()) {
                throw new SQLException("audit_chain_head: row missing; run AuditSchema.install first");
            }
            seq = rs.getLong(1);
            prev = rs.getString(2);
        }
        Instant now = databaseTime(c, dialect);
        List<AuditRecord> stored = new ArrayList<>(pending.size());
        try (PreparedStatement insert = c.prepareStatement(RecordRows.INSERT)) {
            for (Pending p : pending) {
                AuditEntry e = p.entry();
                SignatureFields s = p.signature();
                AuditRecord unhashed = new AuditRecord(++seq, UUID.randomUUID().toString(), now, e.userId(),
                        e.action(), e.objectType(), e.objectId(), e.objectVersion(), e.oldValue(), e.newValue(),
                        e.reason(), s.signerName(), s.meaning(), s.contentSha256(), prev, null);
                String hash = ChainHash.of(unhashed);
                AuditRecord r = new AuditRecord(unhashed.sequence(), unhashed.recordId(), now, e.userId(),
                        e.action(), e.objectType(), e.objectId(), e.objectVersion(), e.oldValue(), e.newValue(),
                        e.reason(), s.signerName(), s.meaning(), s.contentSha256(), prev, hash);
                RecordRows.bind(insert, r);
                if (pending.size() == 1) {
                    insert.executeUpdate();
                } else {
                    insert.addBatch();
                }
                stored.add(r);
                prev = hash;
            }
            if (pending.size() > 1) {
                insert.executeBatch();
            }
        }
        advanceHead(c, stored);
        return List.copyOf(stored);
    }

    private static void advanceHead(Connection c, List<AuditRecord> stored) throws SQLException {
        AuditRecord last = stored.get(stored.size() - 1);
        try (PreparedStatement head = c.prepareStatement(
                "UPDATE audit_chain_head SET last_seq = ?, last_hash = ?, last_record_id = ? WHERE id = 1")) {
            head.setLong(1, last.sequence());
            head.setString(2, last.hash());
            head.setString(3, last.recordId());
            head.executeUpdate();
        }
    }

    private static Instant databaseTime(Connection c, Dialect dialect) throws SQLException {
        try (PreparedStatement q = c.prepareStatement(dialect.clockQuery()); ResultSet rs = q.executeQuery()) {
            rs.next();
            return RecordRows.toStoredPrecision(rs.getObject(1, OffsetDateTime.class).toInstant());
        }
    }
}
