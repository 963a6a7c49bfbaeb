package org.tracegas.store.internal;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.List;

import org.tracegas.audit.AuditRecord;
import org.tracegas.audit.internal.ChainHash;
import org.tracegas.audit.internal.RecordRows;

/**
 * What someone with full database access and this program's source could do: after changing result rows,
 * rehash their bindings, the binding digests of the records and the whole chain from its first record, so that
 * everything inside the database is consistent again. Only an anchor kept outside reveals it.
 */
public final class Forger {

    private Forger() {
    }

    /** Rewrites bindings of results, the records' digests and the chain; the append-only guards are switched off. */
    public static void rewrite(Connection c) throws SQLException {
        boolean h2 = c.getMetaData().getDatabaseProductName().startsWith("H2");
        try (Statement s = c.createStatement()) {
            if (h2) {
                s.execute("DROP TRIGGER audit_record_append_only");
                s.execute("DROP TRIGGER audit_chain_head_guard");
            } else {
                s.execute("ALTER TABLE audit_record DISABLE TRIGGER USER");
                s.execute("ALTER TABLE audit_chain_head DISABLE TRIGGER USER");
            }
        }
        try (PreparedStatement rows = c.prepareStatement(RowBindings.selectByKey(DataKind.RESULT));
                PreparedStatement update = c.prepareStatement(
                        "UPDATE data_binding SET row_sha256 = ? WHERE kind = 'result' AND row_key = ?");
                Statement s = c.createStatement();
                ResultSet keys = s.executeQuery("SELECT id FROM analysis_result")) {
            while (keys.next()) {
                rows.setString(1, keys.getString(1));
                try (ResultSet rs = rows.executeQuery()) {
                    rs.next();
                    update.setString(1, DataKind.RESULT.sha256(rs));
                }
                update.setString(2, keys.getString(1));
                update.executeUpdate();
            }
        }
        List<AuditRecord> records = new ArrayList<>();
        try (Statement s = c.createStatement();
                ResultSet rs = s.executeQuery("SELECT " + RecordRows.COLUMNS + " FROM audit_record ORDER BY seq")) {
            while (rs.next()) {
                records.add(RecordRows.read(rs));
            }
        }
        try (Statement s = c.createStatement()) {
            s.executeUpdate("DELETE FROM audit_record");
        }
        String prev = ChainHash.GENESIS;
        AuditRecord last = null;
        try (PreparedStatement insert = c.prepareStatement(RecordRows.INSERT)) {
            for (AuditRecord r : records) {
                String content = r.contentSha256();
                if (content != null && r.signerName() == null) {
                    content = digest(c, r.sequence());
                }
                AuditRecord unhashed = new AuditRecord(r.sequence(), r.recordId(), r.recordedAt(), r.userId(),
                        r.action(), r.objectType(), r.objectId(), r.objectVersion(), r.oldValue(), r.newValue(),
                        r.reason(), r.signerName(), r.meaning(), content, prev, null);
                String hash = ChainHash.of(unhashed);
                last = new AuditRecord(r.sequence(), r.recordId(), r.recordedAt(), r.userId(), r.action(),
                        r.objectType(), r.objectId(), r.objectVersion(), r.oldValue(), r.newValue(), r.reason(),
                        r.signerName(), r.meaning(), content, prev, hash);
                RecordRows.bind(insert, last);
                insert.executeUpdate();
                prev = hash;
            }
        }
        try (PreparedStatement head = c.prepareStatement(
                "UPDATE audit_chain_head SET last_seq = ?, last_hash = ?, last_record_id = ? WHERE id = 1")) {
            head.setLong(1, last.sequence());
            head.setString(2, last.hash());
            head.setString(3, last.recordId());
            head.executeUpdate();
        }
    }

    private static String digest(Connection c, long seq) throws SQLException {
        RowBindings.Digest d = new RowBindings.Digest();
        try (PreparedStatement q = c.prepareStatement(
                "SELECT kind, row_key, row_sha256 FROM data_binding WHERE audit_seq = ? ORDER BY ordinal")) {
            q.setLong(1, seq);
            try (ResultSet rs = q.executeQuery()) {
                while (rs.next()) {
                    d.add(rs.getString(1), rs.getString(2), rs.getString(3));
                }
            }
        }
        return d.sha256Hex();
    }
}
