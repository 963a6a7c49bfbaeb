package org.tracegas.store.internal;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.time.Instant;
import java.time.OffsetDateTime;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.tracegas.audit.AuditEntry;
import org.tracegas.audit.AuditRecord;
import org.tracegas.audit.AuditTrail;

/** One open transaction: small JDBC helpers and the audit record of the change. */
final class Tx {

    /** Maps the current row of a result set. */
    @FunctionalInterface
    interface RowMapper<T> {
        T map(ResultSet rs) throws SQLException;
    }

    private final Connection connection;
    /** Rows written since the last audit record, bound to the next one. */
    private final List<RowBindings.RowRef> written = new ArrayList<>();

    Tx(Connection connection) {
        this.connection = connection;
    }

    Connection connection() {
        return connection;
    }

    /** Marks a data row as written or changed: the next audit record of this transaction vouches for it. */
    void wrote(DataKind kind, String key) {
        written.add(new RowBindings.RowRef(kind, key));
    }

    /**
     * Appends the audit record of this transaction's change, vouching for the rows marked by {@link #wrote}
     * since the last record. This is the only place where the storage layer writes the audit trail; it shares
     * the transaction, so a rollback removes the record and its bindings too.
     */
    void audit(AuditEntry entry) throws SQLException {
        auditAll(List.of(entry), List.of(List.of()));
    }

    /**
     * As {@link #audit}, for several records in order, with one lock of the chain head and one batched insert;
     * record i vouches for {@code rows.get(i)}, the first also for the rows marked by {@link #wrote}.
     */
    void auditAll(List<AuditEntry> entries, List<List<RowBindings.RowRef>> rows) throws SQLException {
        List<List<RowBindings.RowRef>> bound = new ArrayList<>(rows);
        if (!written.isEmpty()) {
            List<RowBindings.RowRef> first = new ArrayList<>(written);
            first.addAll(rows.get(0));
            bound.set(0, first);
            written.clear();
        }
        List<List<String>> hashes = new ArrayList<>(bound.size());
        List<String> digests = new ArrayList<>(bound.size());
        for (List<RowBindings.RowRef> r : bound) {
            List<String> h = RowBindings.hashes(connection, r);
            hashes.add(h);
            digests.add(RowBindings.digest(r, h));
        }
        List<AuditRecord> records = AuditTrail.appendAllBound(connection, entries, digests);
        for (int i = 0; i < records.size(); i++) {
            RowBindings.insert(connection, records.get(i).sequence(), bound.get(i), hashes.get(i));
        }
    }

    int update(String sql, Object... params) throws SQLException {
        try (PreparedStatement ps = prepare(sql, params)) {
            return ps.executeUpdate();
        }
    }

    <T> Optional<T> queryOne(String sql, RowMapper<T> mapper, Object... params) throws SQLException {
        try (PreparedStatement ps = prepare(sql, params); ResultSet rs = ps.executeQuery()) {
            return rs.next() ? Optional.of(mapper.map(rs)) : Optional.empty();
        }
    }

    <T> List<T> queryList(String sql, RowMapper<T> mapper, Object... params) throws SQLException {
        try (PreparedStatement ps = prepare(sql, params); ResultSet rs = ps.executeQuery()) {
            List<T> rows = new ArrayList<>();
            while (rs.next()) {
                rows.add(mapper.map(rs));
            }
            return rows;
        }
    }

    PreparedStatement prepare(String sql, Object... params) throws SQLException {
        PreparedStatement ps = connection.prepareStatement(sql);
        try {
            bind(ps, params);
        } catch (SQLException | RuntimeException e) {
            ps.close();
            throw e;
        }
        return ps;
    }

    static void bind(PreparedStatement ps, Object... params) throws SQLException {
        for (int i = 0; i < params.length; i++) {
            Object p = params[i];
            if (p instanceof Instant t) {
                ps.setObject(i + 1, OffsetDateTime.ofInstant(t, ZoneOffset.UTC));
            } else if (p instanceof Enum<?> e) {
                ps.setString(i + 1, e.name());
            } else if (p == null) {
                ps.setNull(i + 1, java.sql.Types.NULL);
            } else {
                ps.setObject(i + 1, p);
            }
        }
    }

    static Instant instant(ResultSet rs, String column) throws SQLException {
        OffsetDateTime t = rs.getObject(column, OffsetDateTime.class);
        return t == null ? null : t.toInstant();
    }
}
