package org.tracegas.audit;

import java.sql.Connection;
import java.sql.SQLException;
import java.sql.Statement;

import org.tracegas.audit.internal.Dialect;
import org.tracegas.audit.internal.H2TriggerClasses;

/**
 * Creates the audit tables (audit_record, audit_chain_head) in the connection's current schema, with
 * database triggers that refuse UPDATE, DELETE and TRUNCATE of audit records (PostgreSQL: PL/pgSQL
 * trigger functions; H2: Java triggers). Idempotent: call it at every start-up, before the first
 * {@link AuditTrail#append}; on H2 it also makes the trigger classes loadable by H2.
 */
public final class AuditSchema {

    /** Key of the PostgreSQL advisory lock that serializes concurrent installs (any fixed number). */
    private static final long INSTALL_LOCK = 0x7472616365676173L;

    private AuditSchema() {
    }

    /**
     * Installs or confirms the schema in one transaction, committed here; the connection's auto-commit
     * setting is restored afterwards.
     *
     * @throws SQLException when the database is neither H2 nor PostgreSQL 14+, or refuses the DDL
     */
    public static void install(Connection c) throws SQLException {
        Dialect dialect = Dialect.of(c);
        if (dialect == Dialect.H2) {
            H2TriggerClasses.register();
        }
        boolean autoCommit = c.getAutoCommit();
        c.setAutoCommit(false);
        try (Statement s = c.createStatement()) {
            if (dialect == Dialect.POSTGRESQL) {
                // runners opening the workspace at the same moment would otherwise deadlock on the trigger DDL
                s.execute("SELECT pg_advisory_xact_lock(" + INSTALL_LOCK + ")");
            }
            for (String sql : dialect.ddl()) {
                s.execute(sql);
            }
            c.commit();
        } catch (SQLException | RuntimeException e) {
            c.rollback();
            throw e;
        } finally {
            c.setAutoCommit(autoCommit);
        }
    }
}
