package org.tracegas.store.internal;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;

import org.tracegas.audit.CanonicalRow;

/**
 * Binds the data rows a transaction wrote to the audit record it appends: each row is hashed with
 * {@link CanonicalRow} ({@link DataKind} names the columns), the list of (kind, key, hash) is digested into
 * the record's content hash, and the list is kept in table data_binding under the record's sequence number.
 * A row comes with its hash when its writer took it from the values it inserted, in the form they are stored
 * (times in whole microseconds, text as given, exact doubles), which is what a later reader of the row
 * computes; any other row is read back as stored and hashed.
 */
final class RowBindings {

    /**
     * A data row: its kind and key, and its SHA-256 when the writer took it from the values it inserted
     * ({@link DataKind#sha256(java.util.Map)}); null to read the row back and hash it as stored.
     */
    record RowRef(DataKind kind, String key, String sha256) {

        /** A row to read back when it is bound. */
        RowRef(DataKind kind, String key) {
            this(kind, key, null);
        }
    }

    /** The kind under which a record's binding list is digested. */
    static final String LIST_KIND = "data-binding";

    private RowBindings() {
    }

    /**
     * The SHA-256 of each row as stored now, in order: the one it came with, or its hash read back.
     *
     * @throws SQLException naming the row when it is not stored
     */
    static List<String> hashes(Connection c, List<RowRef> rows) throws SQLException {
        List<String> hashes = new ArrayList<>(rows.size());
        Map<DataKind, PreparedStatement> queries = new EnumMap<>(DataKind.class);
        try {
            for (RowRef r : rows) {
                if (r.sha256() != null) {
                    hashes.add(r.sha256());
                    continue;
                }
                PreparedStatement q = queries.get(r.kind());
                if (q == null) {
                    q = c.prepareStatement(selectByKey(r.kind()));
                    queries.put(r.kind(), q);
                }
                String[] parts = r.kind().keyColumns().length == 1 ? new String[] {r.key()} : r.key().split("/", -1);
                for (int i = 0; i < parts.length; i++) {
                    q.setString(i + 1, parts[i]);
                }
                try (ResultSet rs = q.executeQuery()) {
                    if (!rs.next()) {
                        throw new SQLException(r.kind().label() + " " + r.key() + ": not stored, cannot be bound");
                    }
                    hashes.add(r.kind().sha256(rs));
                }
            }
        } finally {
            for (PreparedStatement q : queries.values()) {
                q.close();
            }
        }
        return hashes;
    }

    /** Query of one row's bound columns by its key columns. */
    static String selectByKey(DataKind kind) {
        List<String> where = new ArrayList<>();
        for (String k : kind.keyColumns()) {
            where.add("t." + k + " = ?");
        }
        return "SELECT " + kind.selectList("t") + " FROM " + kind.table() + " t WHERE " + String.join(" AND ", where);
    }

    /** The digest an audit record holds for its binding list, or null for an empty list. */
    static String digest(List<RowRef> rows, List<String> hashes) {
        if (rows.isEmpty()) {
            return null;
        }
        Digest d = new Digest();
        for (int i = 0; i < rows.size(); i++) {
            d.add(rows.get(i).kind().label(), rows.get(i).key(), hashes.get(i));
        }
        return d.sha256Hex();
    }

    /** Keeps the binding list of the record with sequence number {@code auditSeq}. */
    static void insert(Connection c, long auditSeq, List<RowRef> rows, List<String> hashes) throws SQLException {
        if (rows.isEmpty()) {
            return;
        }
        try (PreparedStatement ps = c.prepareStatement(
                "INSERT INTO data_binding (audit_seq, ordinal, kind, row_key, row_sha256) VALUES (?, ?, ?, ?, ?)")) {
            for (int i = 0; i < rows.size(); i++) {
                ps.setLong(1, auditSeq);
                ps.setInt(2, i);
                ps.setString(3, rows.get(i).kind().label());
                ps.setString(4, rows.get(i).key());
                ps.setString(5, hashes.get(i));
                ps.addBatch();
            }
            ps.executeBatch();
        }
    }

    /** The digest of one binding list, fed in ordinal order. */
    static final class Digest {
        private final CanonicalRow row = CanonicalRow.of(LIST_KIND);

        void add(String kind, String key, String rowSha256) {
            row.text(kind).text(key).text(rowSha256);
        }

        String sha256Hex() {
            return row.sha256Hex();
        }
    }
}
