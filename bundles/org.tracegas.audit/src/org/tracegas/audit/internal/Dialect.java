package org.tracegas.audit.internal;

import java.sql.Connection;
import java.sql.SQLException;
import java.util.Locale;

/** The database products the audit trail runs on, and what differs between them. */
public enum Dialect {
    /** H2 2.x; time is the database's CURRENT_TIMESTAMP (start of the transaction). */
    H2("schema-h2.sql", "SELECT CURRENT_TIMESTAMP"),
    /** PostgreSQL 14 or later; time is the server's clock_timestamp() when the chain head is locked. */
    POSTGRESQL("schema-postgresql.sql", "SELECT clock_timestamp()");

    private final String schemaScript;
    private final String clockQuery;

    Dialect(String schemaScript, String clockQuery) {
        this.schemaScript = schemaScript;
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

    public String schemaScript() {
        return schemaScript;
    }

    /** Query returning the database clock as TIMESTAMP WITH TIME ZONE. */
    public String clockQuery() {
        return clockQuery;
    }
}
