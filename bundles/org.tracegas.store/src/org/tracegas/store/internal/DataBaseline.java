package org.tracegas.store.internal;

import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;

import org.tracegas.audit.AuditAction;
import org.tracegas.audit.AuditEntry;

/**
 * Binds the data of a workspace written before data rows were bound to the audit trail (schema before V6): one
 * audit record, appended when the workspace is first opened with binding, vouches for every row as found then.
 * It is appended only while no audit record vouches for data yet, so it cannot be repeated later to cover a
 * change; whatever was changed before it is beyond what the trail can show, and its record says so.
 */
final class DataBaseline {

    /** The acting user of the baseline record: the store itself. */
    static final String SYSTEM_USER = "system";

    private DataBaseline() {
    }

    /** @return whether a baseline record was appended */
    static boolean bindExistingData(Transactions transactions) {
        return transactions.run("binding the data stored before data binding", tx -> {
            if (tx.queryOne("SELECT 1 FROM data_binding", rs -> 1).isPresent()) {
                return false; // the usual case, answered from the first row
            }
            if (tx.queryOne("SELECT 1 FROM audit_record WHERE content_sha256 IS NOT NULL AND signer_name IS NULL",
                    rs -> 1).isPresent()) {
                return false;
            }
            long rows = 0;
            for (DataKind kind : DataKind.values()) {
                try (PreparedStatement ps = tx.connection().prepareStatement("SELECT " + kind.keyExpression("t")
                        + " FROM " + kind.table() + " t"); ResultSet rs = ps.executeQuery()) {
                    while (rs.next()) {
                        tx.wrote(kind, rs.getString(1));
                        rows++;
                    }
                }
            }
            if (rows == 0) {
                return false;
            }
            tx.audit(AuditEntry.builder(SYSTEM_USER, AuditAction.CREATE, "data-binding", "baseline")
                    .reason("binding of the " + rows + " data rows stored before data rows were bound to the audit"
                            + " trail; changes made to them before now cannot be shown")
                    .build());
            return true;
        });
    }
}
