package org.tracegas.store;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.SQLException;
import java.sql.Statement;

import org.junit.jupiter.api.io.TempDir;

/** Tampering with an embedded H2 workspace file through a second connection, as H2's shell would. */
class H2TamperDetectionTest extends TamperDetectionContract {

    @TempDir
    Path folder;

    @Override
    TestBackend newBackend() {
        return new H2Backend(folder);
    }

    @Override
    Connection tamperingConnection() throws SQLException {
        Connection c = new H2Backend(folder).raw();
        try (Statement s = c.createStatement()) {
            s.execute("SET REFERENTIAL_INTEGRITY FALSE");
        }
        return c;
    }
}
