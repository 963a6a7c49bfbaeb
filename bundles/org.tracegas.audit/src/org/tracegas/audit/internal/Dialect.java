package org.tracegas.audit.internal;

import java.sql.Connection;
import java.sql.SQLException;
import java.util.List;
import java.util.Locale;

/** The database products the audit trail runs on, and what differs between them. */
public enum Dialect {
    /** H2 2.x; time is the database's CURRENT_TIMESTAMP (start of the transaction). */
    H2(SchemaDdl.H2, "SELECT CURRENT_TIMESTAMP"),
    /** PostgreSQL 14 or later; time is the server's clock_timestamp() when the chain head is locked. */
    POSTGRESQL(SchemaDdl.POSTGRESQL, "SELECT clock_timestamp()");

    private final List<String> ddl;
    private final String clockQuery;

    Dialect(List<String> ddl, String clockQuery) {
        this.ddl = ddl;
        this.clockQuery = clockQuery;
    }

    /** @throws SQLException when the product is neither H2 nor PostgreSQL (message names the product) */
    public static Dialect of(Connection c) throws SQLException {
        String product = c.getMetaData().getDatabaseProductName();
        String p = product.toLowerCase(Locale.ROOT);
        if (p.equals("h2")) {
            return H2;
        }
        if (p.contains("postgresql")) {
            return POSTGRESQL;
        }
        throw new SQLException("database product '" + product + "' is not supported; use H2 or PostgreSQL");
    }

    /** Statements creating the audit tables and triggers; each can be re-run without effect. */
    public List<String> ddl() {
        return ddl;
    }

    /** Query returning the database clock as TIMESTAMP WITH TIME ZONE. */
    public String clockQuery() {
        return clockQuery;
    }
}
