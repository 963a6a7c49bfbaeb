package org.tracegas.store.internal;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.util.ArrayList;
import java.util.List;

import org.tracegas.audit.AuditVerifier;
import org.tracegas.audit.ChainAnchor;
import org.tracegas.audit.VerificationReport;
import org.tracegas.store.DataFinding;
import org.tracegas.store.DataFinding.Kind;
import org.tracegas.store.WorkspaceVerification;

/**
 * Checks the stored data rows against the audit trail, streamed (cursor with a fetch size), so memory does
 * not grow with the workspace. Two passes:
 * <ol>
 * <li>the binding lists against their audit records: the lists, read in (record, ordinal) order, are digested
 * one record at a time and compared with the digest each data record holds (the chain vouches for that);</li>
 * <li>each kind's rows against their newest binding: a row whose hash differs was CHANGED, a row with no
 * binding was INSERTED, a newest binding whose row is gone names a DELETED row.</li>
 * </ol>
 * Rows that match are never reported. The caller runs this in the same snapshot as the chain walk.
 */
public final class DataVerifier {

    private static final int FETCH_SIZE = 1000;

    private final Connection c;
    private final List<DataFinding> findings = new ArrayList<>();
    private boolean truncated;
    private long rowsChecked;

    private DataVerifier(Connection c) {
        this.c = c;
    }

    /**
     * Verifies the chain with the anchors and the data bound to it inside the caller's transaction (one
     * snapshot when it is repeatable-read; a test sees its own uncommitted changes).
     *
     * @throws IllegalStateException when {@code c} is in auto-commit mode (a PostgreSQL cursor would not stream)
     */
    public static WorkspaceVerification verify(Connection c, List<ChainAnchor> anchors) throws SQLException {
        if (c.getAutoCommit()) {
            throw new IllegalStateException("connection: auto-commit is on; verify inside a transaction");
        }
        return new DataVerifier(c).verify(AuditVerifier.verify(c, anchors));
    }

    private WorkspaceVerification verify(VerificationReport chain) throws SQLException {
        checkBindingLists();
        for (DataKind kind : DataKind.values()) {
            checkRows(kind);
            checkDeleted(kind);
        }
        return new WorkspaceVerification(chain, rowsChecked, findings, truncated);
    }

    private void checkBindingLists() throws SQLException {
        // data records hold a digest without signer: signature records' content hash is the signed file's
        try (PreparedStatement records = stream("SELECT seq, content_sha256 FROM audit_record"
                + " WHERE content_sha256 IS NOT NULL AND signer_name IS NULL ORDER BY seq");
                PreparedStatement lists = stream("SELECT audit_seq, kind, row_key, row_sha256 FROM data_binding"
                        + " ORDER BY audit_seq, ordinal");
                ResultSet r = records.executeQuery();
                ResultSet b = lists.executeQuery()) {
            boolean hasRecord = r.next();
            boolean hasBinding = b.next();
            while (hasRecord || hasBinding) {
                long recordSeq = hasRecord ? r.getLong(1) : Long.MAX_VALUE;
                long listSeq = hasBinding ? b.getLong(1) : Long.MAX_VALUE;
                if (listSeq < recordSeq) {
                    // bindings under a record that vouches for no data: each row named
                    while (hasBinding && b.getLong(1) == listSeq) {
                        add(new DataFinding(Kind.BINDINGS_ALTERED, b.getString(2), b.getString(3), listSeq,
                                "bound to audit record " + listSeq + ", which vouches for no data row"));
                        hasBinding = b.next();
                    }
                    continue;
                }
                if (recordSeq < listSeq) {
                    add(new DataFinding(Kind.BINDINGS_REMOVED, "audit-record", Long.toString(recordSeq), recordSeq,
                            "the record vouches for data rows, but their list is gone"));
                    hasRecord = r.next();
                    continue;
                }
                RowBindings.Digest digest = new RowBindings.Digest();
                while (hasBinding && b.getLong(1) == listSeq) {
                    digest.add(b.getString(2), b.getString(3), b.getString(4));
                    hasBinding = b.next();
                }
                if (!digest.sha256Hex().equals(r.getString(2))) {
                    add(new DataFinding(Kind.BINDINGS_ALTERED, "audit-record", Long.toString(recordSeq), recordSeq,
                            "the list of rows bound to the record no longer gives the digest the record holds"));
                }
                hasRecord = r.next();
            }
        }
    }

    private void checkRows(DataKind kind) throws SQLException {
        String key = kind.keyExpression("t");
        try (PreparedStatement q = stream("SELECT " + kind.selectList("t") + ", b.audit_seq, b.row_sha256 FROM "
                + kind.table() + " t LEFT JOIN data_binding b ON b.kind = ? AND b.row_key = " + key
                + " AND b.audit_seq = (SELECT MAX(n.audit_seq) FROM data_binding n WHERE n.kind = ? AND n.row_key = "
                + key + ")")) {
            q.setString(1, kind.label());
            q.setString(2, kind.label());
            try (ResultSet rs = q.executeQuery()) {
                while (rs.next()) {
                    rowsChecked++;
                    String bound = rs.getString("row_sha256");
                    String rowKey = rs.getString("row_key");
                    if (bound == null) {
                        add(new DataFinding(Kind.INSERTED, kind.label(), rowKey, 0,
                                "stored, but no audit record vouches for it"));
                    } else if (!bound.equals(kind.sha256(rs))) {
                        long seq = rs.getLong("audit_seq");
                        add(new DataFinding(Kind.CHANGED, kind.label(), rowKey, seq,
                                "content differs from what audit record " + seq + " vouches for"));
                    }
                }
            }
        }
    }

    private void checkDeleted(DataKind kind) throws SQLException {
        try (PreparedStatement q = stream("SELECT b.row_key, MAX(b.audit_seq) FROM data_binding b WHERE b.kind = ?"
                + " AND NOT EXISTS (SELECT 1 FROM " + kind.table() + " t WHERE " + kind.keyExpression("t")
                + " = b.row_key) GROUP BY b.row_key ORDER BY b.row_key")) {
            q.setString(1, kind.label());
            try (ResultSet rs = q.executeQuery()) {
                while (rs.next()) {
                    long seq = rs.getLong(2);
                    add(new DataFinding(Kind.DELETED, kind.label(), rs.getString(1), seq,
                            "audit record " + seq + " vouches for it, but it is no longer stored"));
                }
            }
        }
    }

    private PreparedStatement stream(String sql) throws SQLException {
        PreparedStatement ps = c.prepareStatement(sql, ResultSet.TYPE_FORWARD_ONLY, ResultSet.CONCUR_READ_ONLY);
        ps.setFetchSize(FETCH_SIZE);
        return ps;
    }

    private void add(DataFinding f) {
        if (findings.size() < WorkspaceVerification.MAX_FINDINGS) {
            findings.add(f);
        } else {
            truncated = true;
        }
    }
}
