package org.tracegas.audit.internal;

import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Types;
import java.time.Instant;
import java.time.OffsetDateTime;
import java.time.ZoneOffset;

import org.tracegas.audit.AuditAction;
import org.tracegas.audit.AuditRecord;
import org.tracegas.audit.SignatureMeaning;

/** Mapping between audit_record rows and {@link AuditRecord}. */
public final class RecordRows {

    /** Column list in the order {@link #read} and {@link #bind} use. */
    public static final String COLUMNS = "seq, record_id, recorded_at, user_id, action, object_type, object_id,"
            + " object_version, old_value, new_value, reason, signer_name, meaning, content_sha256, prev_hash, hash";

    public static final String INSERT = "INSERT INTO audit_record (" + COLUMNS
            + ") VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)";

    private RecordRows() {
    }

    /**
     * Reads the current row (selected with {@link #COLUMNS}). An action or meaning name that is not one of
     * ours is reported as an {@link SQLException} naming the sequence number.
     */
    public static AuditRecord read(ResultSet rs) throws SQLException {
        AuditRecord r = readLenient(rs);
        if (r.action() == null) {
            throw new SQLException("audit record " + r.sequence() + ": action '" + rs.getString(5) + "' or meaning '"
                    + rs.getString(13) + "' is not a known value");
        }
        return r;
    }

    /**
     * Reads the current row; an unknown action or meaning gives a record whose action is null, so that the
     * verifier can report it instead of failing.
     */
    public static AuditRecord readLenient(ResultSet rs) throws SQLException {
        OffsetDateTime at = rs.getObject(3, OffsetDateTime.class);
        AuditAction action = parse(AuditAction.class, rs.getString(5));
        String meaningName = rs.getString(13);
        SignatureMeaning meaning = meaningName == null ? null : parse(SignatureMeaning.class, meaningName);
        if (meaningName != null && meaning == null) {
            action = null;
        }
        return new AuditRecord(rs.getLong(1), rs.getString(2), at == null ? null : at.toInstant(), rs.getString(4),
                action, rs.getString(6), rs.getString(7), rs.getLong(8), rs.getString(9), rs.getString(10),
                rs.getString(11), rs.getString(12), meaning, rs.getString(14), rs.getString(15), rs.getString(16));
    }

    private static <E extends Enum<E>> E parse(Class<E> type, String name) {
        try {
            return name == null ? null : Enum.valueOf(type, name);
        } catch (IllegalArgumentException e) {
            return null;
        }
    }

    /** Binds all columns of {@code r} to the {@link #INSERT} statement. */
    public static void bind(PreparedStatement ps, AuditRecord r) throws SQLException {
        ps.setLong(1, r.sequence());
        ps.setString(2, r.recordId());
        ps.setObject(3, OffsetDateTime.ofInstant(r.recordedAt(), ZoneOffset.UTC));
        ps.setString(4, r.userId());
        ps.setString(5, r.action().name());
        ps.setString(6, r.objectType());
        ps.setString(7, r.objectId());
        ps.setLong(8, r.objectVersion());
        ps.setString(9, r.oldValue());
        ps.setString(10, r.newValue());
        ps.setString(11, r.reason());
        ps.setString(12, r.signerName());
        if (r.meaning() == null) {
            ps.setNull(13, Types.VARCHAR);
        } else {
            ps.setString(13, r.meaning().name());
        }
        ps.setString(14, r.contentSha256());
        ps.setString(15, r.previousHash());
        ps.setString(16, r.hash());
    }

    /** {@code t} truncated to microseconds, the precision both databases keep. */
    public static Instant toStoredPrecision(Instant t) {
        return t.truncatedTo(java.time.temporal.ChronoUnit.MICROS);
    }
}
