package org.tracegas.audit.internal;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;

import org.h2.api.Trigger;

/**
 * H2 row trigger (BEFORE UPDATE, DELETE on audit_chain_head): the head may only advance, to a stored
 * record with the given hash, and may never be deleted.
 */
public final class H2ChainHeadTrigger implements Trigger {

    /** SQLSTATE "insufficient privilege", as PostgreSQL reports it for the same refusals. */
    static final String INSUFFICIENT_PRIVILEGE = "42501";

    private String recordTable;

    @Override
    public void init(Connection conn, String schemaName, String triggerName, String tableName, boolean before,
            int type) {
        recordTable = '"' + schemaName.replace("\"", "\"\"") + "\".AUDIT_RECORD";
    }

    @Override
    public void fire(Connection conn, Object[] oldRow, Object[] newRow) throws SQLException {
        if (newRow == null) {
            throw new SQLException("audit chain head: DELETE refused", INSUFFICIENT_PRIVILEGE);
        }
        long oldSeq = ((Number) oldRow[1]).longValue();
        long newSeq = ((Number) newRow[1]).longValue();
        if (!oldRow[0].equals(newRow[0]) || newSeq <= oldSeq) {
            throw new SQLException("audit chain head: may only advance (from " + oldSeq + " to "
                    + newSeq + ")", INSUFFICIENT_PRIVILEGE);
        }
        try (PreparedStatement q = conn.prepareStatement(
                "SELECT 1 FROM " + recordTable + " WHERE seq = ? AND hash = ?")) {
            q.setLong(1, newSeq);
            q.setString(2, (String) newRow[2]);
            try (ResultSet rs = q.executeQuery()) {
                if (!rs.next()) {
                    throw new SQLException("audit chain head: record " + newSeq
                            + " with the given hash is not stored", INSUFFICIENT_PRIVILEGE);
                }
            }
        }
    }
}
