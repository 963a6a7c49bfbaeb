package org.tracegas.store;

import java.sql.Connection;
import java.sql.SQLException;
import java.sql.Statement;

/**
 * Tampering on the PostgreSQL server as its superuser (system property tracegas.test.pg.admin, default
 * "postgres", password tracegas.test.pg.admin.password if the server asks for one), with foreign-key triggers
 * off for the session.
 */
class PostgresTamperDetectionTest extends TamperDetectionContract {

    private PostgresBackend pg;

    @Override
    TestBackend newBackend() throws Exception {
        pg = new PostgresBackend();
        return pg;
    }

    @Override
    Connection tamperingConnection() throws SQLException {
        Connection c = pg.connectAs(System.getProperty("tracegas.test.pg.admin", "postgres"),
                System.getProperty("tracegas.test.pg.admin.password", ""));
        try (Statement s = c.createStatement()) {
            s.execute("SET session_replication_role = replica");
        }
        return c;
    }
}
