package org.tracegas.audit;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.time.OffsetDateTime;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.List;
import java.util.function.Consumer;

import org.tracegas.audit.internal.Csv;
import org.tracegas.audit.internal.RecordRows;
import org.tracegas.audit.internal.Snapshot;

/**
 * Review of the audit trail: filtered queries, CSV export for inspection and copying (21 CFR 11.10(e):
 * available for review and copying), together with the chain's verification state.
 */
public final class AuditReview {

    /** CSV header, one column per {@link AuditRecord} component. */
    public static final List<String> CSV_HEADER = List.of("sequence", "record_id", "recorded_at_utc", "user_id",
            "action", "object_type", "object_id", "object_version", "old_value", "new_value", "reason",
            "signer_name", "meaning", "content_sha256", "previous_hash", "hash");

    private static final int FETCH_SIZE = 1000;

    /** Records matching a query together with the state of the whole chain when they were read. */
    public record Result(List<AuditRecord> records, VerificationReport chain) {
        public Result {
            records = List.copyOf(records);
        }
    }

    private AuditReview() {
    }

    /** Matching records in sequence order, and the chain's verification, read in one snapshot. */
    public static Result review(Connection c, AuditQuery q) throws SQLException {
        return Snapshot.read(c, conn -> {
            List<AuditRecord> records = new ArrayList<>();
            forEach(conn, q, records::add);
            return new Result(records, AuditVerifier.verify(conn));
        });
    }

    /** Streams the matching records in sequence order to {@code sink}. */
    public static void forEach(Connection c, AuditQuery q, Consumer<AuditRecord> sink) throws SQLException {
        StringBuilder sql = new StringBuilder("SELECT " + RecordRows.COLUMNS + " FROM audit_record WHERE 1 = 1");
        List<Object> args = new ArrayList<>();
        where(sql, args, "user_id = ?", q.userId());
        where(sql, args, "object_type = ?", q.objectType());
        where(sql, args, "object_id = ?", q.objectId());
        where(sql, args, "recorded_at >= ?", q.from() == null ? null : OffsetDateTime.ofInstant(q.from(), ZoneOffset.UTC));
        where(sql, args, "recorded_at < ?", q.to() == null ? null : OffsetDateTime.ofInstant(q.to(), ZoneOffset.UTC));
        if (!q.actions().isEmpty()) {
            sql.append(" AND action IN (").append(String.join(", ", Collections.nCopies(q.actions().size(), "?")))
                    .append(')');
            q.actions().stream().map(Enum::name).sorted().forEach(args::add);
        }
        sql.append(" ORDER BY seq");
        Snapshot.read(c, conn -> {
            try (PreparedStatement ps = conn.prepareStatement(sql.toString())) {
                ps.setFetchSize(FETCH_SIZE);
                for (int i = 0; i < args.size(); i++) {
                    ps.setObject(i + 1, args.get(i));
                }
                try (ResultSet rs = ps.executeQuery()) {
                    while (rs.next()) {
                        sink.accept(RecordRows.read(rs));
                    }
                }
            }
            return null;
        });
    }

    /**
     * Writes the matching records as CSV (RFC 4180, header line {@link #CSV_HEADER}, times in ISO-8601 UTC).
     *
     * @return number of records written
     */
    public static long exportCsv(Connection c, AuditQuery q, Writer out) throws SQLException, IOException {
        Csv csv = new Csv(out);
        csv.line(CSV_HEADER);
        long[] count = {0};
        try {
            forEach(c, q, r -> {
                try {
                    csv.line(Arrays.asList(Long.toString(r.sequence()), r.recordId(), r.recordedAt().toString(),
                            r.userId(), r.action().name(), r.objectType(), r.objectId(),
                            Long.toString(r.objectVersion()), r.oldValue(), r.newValue(), r.reason(), r.signerName(),
                            r.meaning() == null ? null : r.meaning().name(), r.contentSha256(), r.previousHash(),
                            r.hash()));
                    count[0]++;
                } catch (IOException e) {
                    throw new UncheckedIOException(e);
                }
            });
        } catch (UncheckedIOException e) {
            throw e.getCause();
        }
        out.flush();
        return count[0];
    }

    private static void where(StringBuilder sql, List<Object> args, String condition, Object value) {
        if (value != null) {
            sql.append(" AND ").append(condition);
            args.add(value);
        }
    }
}
