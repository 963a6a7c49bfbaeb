package org.tracegas.store.internal;

import java.sql.Connection;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.List;

import org.flywaydb.core.api.migration.BaseJavaMigration;
import org.flywaydb.core.api.migration.Context;

/**
 * Lets a work unit be FAILED, with the error that stopped its processing. The state check of V3 has no name of
 * its own (H2 and PostgreSQL each generate one), so plain SQL cannot drop it on both: it is looked up in the
 * standard information schema, which both databases provide, and replaced by a named check.
 */
public final class V5__work_unit_failed extends BaseJavaMigration {

    @Override
    public void migrate(Context context) throws SQLException {
        Connection c = context.getConnection();
        List<String> checks = new ArrayList<>();
        try (Statement st = c.createStatement();
                ResultSet rs = st.executeQuery("SELECT t.constraint_name FROM information_schema.table_constraints t"
                        + " JOIN information_schema.check_constraints k ON k.constraint_name = t.constraint_name"
                        + " AND k.constraint_schema = t.constraint_schema WHERE t.table_schema = CURRENT_SCHEMA"
                        + " AND UPPER(t.table_name) = 'WORK_UNIT'"
                        + " AND t.constraint_type = 'CHECK' AND k.check_clause LIKE '%CLAIMED%'")) {
            while (rs.next()) {
                checks.add(rs.getString(1));
            }
        }
        if (checks.size() != 1) {
            throw new IllegalStateException("expected one state check on work_unit, found " + checks);
        }
        try (Statement st = c.createStatement()) {
            st.execute("ALTER TABLE work_unit DROP CONSTRAINT \"" + checks.get(0).replace("\"", "\"\"") + "\"");
            st.execute("ALTER TABLE work_unit ADD CONSTRAINT work_unit_state"
                    + " CHECK (state IN ('OPEN', 'CLAIMED', 'DONE', 'FAILED'))");
            st.execute("ALTER TABLE work_unit ADD COLUMN failure VARCHAR(4000)");
        }
    }
}
