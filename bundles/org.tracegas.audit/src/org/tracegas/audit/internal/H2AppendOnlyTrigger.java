package org.tracegas.audit.internal;

import java.sql.Connection;
import java.sql.SQLException;

import org.h2.api.Trigger;

/**
 * H2 row trigger (BEFORE UPDATE, DELETE on audit_record) that refuses every change to a stored audit
 * record: the trail is append-only (21 CFR 11.10(e): prior entries are not obscured).
 */
public final class H2AppendOnlyTrigger implements Trigger {

    private String table = "audit_record";
    private int type;

    @Override
    public void init(Connection conn, String schemaName, String triggerName, String tableName, boolean before,
            int type) {
        this.table = schemaName + "." + tableName;
        this.type = type;
    }

    @Override
    public void fire(Connection conn, Object[] oldRow, Object[] newRow) throws SQLException {
        String operation = newRow == null ? "DELETE" : (type & Trigger.UPDATE) != 0 ? "UPDATE" : "change";
        throw new SQLException("audit records are append-only: " + operation + " on " + table + " refused",
                H2ChainHeadTrigger.INSUFFICIENT_PRIVILEGE);
    }
}
