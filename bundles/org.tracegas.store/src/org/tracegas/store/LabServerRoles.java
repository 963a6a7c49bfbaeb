package org.tracegas.store;

import java.sql.Connection;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.List;

/**
 * Splits the work on a PostgreSQL lab server between two database roles: the schema's owner, which creates and
 * migrates the schema (open the workspace once as the owner after each upgrade), and an everyday role, which the
 * runners and workbenches log in as. The everyday role may read and add rows, and update only the columns the
 * store's services change (a user's roles and lock, a project's name, a grant's access, a draft method or library
 * version, the runners' schedule, the audit chain head, which its trigger lets only advance); it may not delete
 * or truncate anything, change stored measurements, spectra, results, QA outcomes, issued reports or audit records, or change the
 * schema. What it may still change is bound to the audit trail and verified like everything else.
 */
public final class LabServerRoles {

    /** Tables the everyday role reads and adds rows to, and nothing more unless listed in {@link #UPDATABLE}. */
    static final List<String> TABLES = List.of("app_user", "client", "project", "project_grant", "measurement",
            "spectral_data", "versioned_item", "content_version", "analysis_result", "qa_check", "work_batch",
            "work_unit", "work_unit_measurement", "raw_file", "imported_measurement", "processing_recipe",
            "report", "data_binding", "audit_record", "audit_chain_head", "site", "emission_source", "instrument",
            "project_source", "measurement_instrument");

    /** The columns the store's services update, per table. */
    static final List<String> UPDATABLE = List.of(
            "app_user (roles, failed_logins, locked, row_version)",
            "project (name, row_version)",
            "project_grant (access)",
            "project_source (source_id)",
            "content_version (content, content_hash, reason, author_id, frozen, row_version)",
            "work_unit (state, claimed_by, lease_until, done_at, attempt, failure)",
            "audit_chain_head (last_seq, last_hash, last_record_id)");

    private LabServerRoles() {
    }

    /**
     * Grants the everyday role what the store needs in the connection's current schema; run it as the owner,
     * after the schema was created or migrated. Revokes first, so that running it again gives the same rights.
     *
     * @param owner connection of the schema's owner to the workspace's schema
     * @param role  the everyday role, an existing PostgreSQL role name (letters, digits, underscore)
     * @throws IllegalArgumentException if the role name is not a plain identifier
     */
    public static void grantEverydayWork(Connection owner, String role) throws SQLException {
        if (role == null || !role.matches("[A-Za-z_][A-Za-z0-9_]{0,62}")) {
            throw new IllegalArgumentException("role: not a plain PostgreSQL role name: " + role);
        }
        try (Statement s = owner.createStatement()) {
            s.execute("DO $$ BEGIN EXECUTE format('GRANT USAGE ON SCHEMA %I TO " + role + "', current_schema()); END $$");
            for (String table : TABLES) {
                s.execute("REVOKE ALL ON " + table + " FROM " + role);
                s.execute("GRANT SELECT, INSERT ON " + table + " TO " + role);
            }
            for (String columns : UPDATABLE) {
                int paren = columns.indexOf('(');
                s.execute("GRANT UPDATE " + columns.substring(paren) + " ON " + columns.substring(0, paren).strip()
                        + " TO " + role);
            }
            s.execute("GRANT SELECT ON schema_history TO " + role);
            s.execute("DO $$ BEGIN EXECUTE format('GRANT USAGE ON ALL SEQUENCES IN SCHEMA %I TO " + role
                    + "', current_schema()); END $$");
        }
    }
}
