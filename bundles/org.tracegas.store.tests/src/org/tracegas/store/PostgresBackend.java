package org.tracegas.store;

import java.sql.Connection;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.UUID;

import org.postgresql.ds.PGSimpleDataSource;

/**
 * A fresh schema on the PostgreSQL server named by the system properties tracegas.test.pg.url, .user and
 * .password (defaults: the local test server), dropped after the test.
 */
final class PostgresBackend implements TestBackend {

    private static final String URL = System.getProperty("tracegas.test.pg.url",
            "jdbc:postgresql://127.0.0.1:55432/tracegas");
    private static final String USER = System.getProperty("tracegas.test.pg.user", "tracegas");
    private static final String PASSWORD = System.getProperty("tracegas.test.pg.password", "tracegas");

    private final String schema = "test_" + UUID.randomUUID().toString().replace("-", "");

    PostgresBackend() throws SQLException {
        try (Connection c = connect(URL); Statement s = c.createStatement()) {
            s.execute("CREATE SCHEMA " + schema);
        }
    }

    private String schemaUrl() {
        return URL + (URL.contains("?") ? "&" : "?") + "currentSchema=" + schema;
    }

    @Override
    public WorkspaceStore open() {
        return Workspaces.openPostgres(schemaUrl(), USER, PASSWORD);
    }

    @Override
    public Connection raw() throws SQLException {
        return connect(schemaUrl());
    }

    /** The JDBC URL of this test's schema, for a child process. */
    String url() {
        return schemaUrl();
    }

    /** A connection to this test's schema as another database role. */
    Connection connectAs(String user, String password) throws SQLException {
        PGSimpleDataSource ds = new PGSimpleDataSource();
        ds.setURL(schemaUrl());
        ds.setUser(user);
        ds.setPassword(password);
        return ds.getConnection();
    }

    String user() {
        return USER;
    }

    String password() {
        return PASSWORD;
    }

    private static Connection connect(String url) throws SQLException {
        PGSimpleDataSource ds = new PGSimpleDataSource();
        ds.setURL(url);
        ds.setUser(USER);
        ds.setPassword(PASSWORD);
        return ds.getConnection();
    }

    @Override
    public void close() throws SQLException {
        try (Connection c = connect(URL); Statement s = c.createStatement()) {
            s.execute("DROP SCHEMA " + schema + " CASCADE");
        }
    }
}
