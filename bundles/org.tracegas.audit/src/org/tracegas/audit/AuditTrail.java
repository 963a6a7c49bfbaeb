package org.tracegas.audit;

import java.sql.Connection;
import java.sql.SQLException;
import java.util.ArrayList;
import java.util.List;

import org.tracegas.audit.internal.ChainWriter;
import org.tracegas.audit.internal.ChainWriter.Pending;
import org.tracegas.audit.internal.ChainWriter.SignatureFields;

/**
 * Secure, computer-generated, time-stamped audit trail (21 CFR 11.10(e); EU GMP Annex 11 section 9).
 * Records are appended in the caller's JDBC transaction, so a business change and its audit record are
 * committed or rolled back together. Time is taken from the database (PostgreSQL clock_timestamp(), H2
 * CURRENT_TIMESTAMP), stored in UTC. Each record carries a sequence number and the SHA-256 chain hash
 * checked by {@link AuditVerifier}.
 *
 * <p>The first append of a transaction locks the chain head until commit or rollback: concurrent
 * appenders wait for each other (keep audited transactions short; on H2 set a LOCK_TIMEOUT that covers
 * the longest one).
 */
public final class AuditTrail {

    private AuditTrail() {
    }

    /**
     * Appends one record inside the caller's transaction (auto-commit must be off); does not commit.
     *
     * @return the stored record with sequence number, time and hash
     * @throws IllegalStateException when {@code c} is in auto-commit mode
     * @throws SQLException          from the database, e.g. a lock timeout; the caller should roll back
     */
    public static AuditRecord append(Connection c, AuditEntry e) throws SQLException {
        return ChainWriter.append(c, List.of(new Pending(e, SignatureFields.NONE))).get(0);
    }

    /**
     * Appends one record that vouches for stored data rows: {@code dataSha256} is the digest of the rows'
     * {@link CanonicalRow} hashes (see the store's binding of data rows), kept in the record's
     * {@link AuditRecord#contentSha256()} and so covered by the chain hash.
     *
     * @see #append(Connection, AuditEntry)
     */
    public static AuditRecord appendBound(Connection c, AuditEntry e, String dataSha256) throws SQLException {
        return appendAllBound(c, List.of(e), java.util.Collections.singletonList(dataSha256)).get(0);
    }

    /**
     * As {@link #appendAll}, each record vouching for the data digest at the same index (null for a record
     * that vouches for no data row).
     *
     * @throws IllegalArgumentException if the lists differ in length or a digest is not a SHA-256 hex value
     */
    public static List<AuditRecord> appendAllBound(Connection c, List<AuditEntry> entries, List<String> dataSha256)
            throws SQLException {
        if (entries.size() != dataSha256.size()) {
            throw new IllegalArgumentException("dataSha256: " + dataSha256.size() + " digests for " + entries.size()
                    + " entries");
        }
        List<Pending> pending = new ArrayList<>(entries.size());
        for (int i = 0; i < entries.size(); i++) {
            String digest = dataSha256.get(i);
            if (digest != null && !org.tracegas.audit.internal.ChainHash.isSha256Hex(digest)) {
                throw new IllegalArgumentException("dataSha256[" + i + "]: not 64 lower-case hex digits: " + digest);
            }
            pending.add(new Pending(entries.get(i), digest == null ? SignatureFields.NONE
                    : new SignatureFields(null, null, digest)));
        }
        return ChainWriter.append(c, pending);
    }

    /**
     * Appends several records in the given order, with one lock and one batched insert; does not commit.
     * All get the same database time.
     *
     * @see #append(Connection, AuditEntry)
     */
    public static List<AuditRecord> appendAll(Connection c, List<AuditEntry> entries) throws SQLException {
        List<Pending> pending = new ArrayList<>(entries.size());
        for (AuditEntry e : entries) {
            pending.add(new Pending(e, SignatureFields.NONE));
        }
        return ChainWriter.append(c, pending);
    }
}
