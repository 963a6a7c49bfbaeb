package org.tracegas.audit;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.Driver;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.Comparator;
import java.util.List;
import java.util.Properties;
import java.util.UUID;
import java.util.stream.Stream;

/**
 * A fresh, real database for one test: an H2 file database in a temporary directory, or a new schema on
 * the PostgreSQL server named by the system properties tracegas.test.pg.url/.user/.password (dropped at
 * close).
 */
abstract class TestDatabase implements AutoCloseable {

    static final String PG_URL = System.getProperty("tracegas.test.pg.url", "jdbc:postgresql://127.0.0.1:55432/tracegas");
    static final String PG_USER = System.getProperty("tracegas.test.pg.user", "tracegas");
    static final String PG_PASSWORD = System.getProperty("tracegas.test.pg.password", "tracegas");

    /** Both kinds, for parameterised tests. */
    static List<String> kinds() {
        return List.of("h2", "postgresql");
    }

    static TestDatabase create(String kind) throws Exception {
        return switch (kind) {
            case "h2" -> new H2();
            case "postgresql" -> new Postgres();
            default -> throw new IllegalArgumentException("kind: " + kind);
        };
    }

    /** A new connection with auto-commit off. */
    final Connection open() throws SQLException {
        Connection c = connect(url(), user(), password());
        c.setAutoCommit(false);
        return c;
    }

    /*
     * Drivers are called directly: DriverManager only sees drivers of the system class loader, which is
     * neither the test launcher's nor an OSGi bundle's.
     */
    static Connection connect(String url, String user, String password) throws SQLException {
        Properties p = new Properties();
        p.setProperty("user", user);
        p.setProperty("password", password);
        Driver driver = url.startsWith("jdbc:h2:") ? new org.h2.Driver() : new org.postgresql.Driver();
        Connection c = driver.connect(url, p);
        if (c == null) {
            throw new SQLException("url: no driver accepts " + url);
        }
        return c;
    }

    /** A new connection with the schema installed. */
    final Connection openInstalled() throws SQLException {
        Connection c = open();
        AuditSchema.install(c);
        return c;
    }

    abstract String url();

    abstract String user();

    abstract String password();

    /** The JDBC URL, user and password, e.g. for a child process. */
    final List<String> connectionArguments() {
        return List.of(url(), user(), password());
    }

    /** Removes the append-only triggers, as an attacker with owner rights on the database could. */
    abstract void dropTriggers(Connection c) throws SQLException;

    static final class H2 extends TestDatabase {
        private final Path dir;

        H2() throws IOException {
            dir = Files.createTempDirectory("audit-h2");
        }

        @Override
        String url() {
            return "jdbc:h2:file:" + dir.resolve("audit") + ";LOCK_TIMEOUT=30000;WRITE_DELAY=0";
        }

        @Override
        String user() {
            return "sa";
        }

        @Override
        String password() {
            return "";
        }

        @Override
        void dropTriggers(Connection c) throws SQLException {
            try (Statement s = c.createStatement()) {
                s.execute("DROP TRIGGER audit_record_append_only");
                s.execute("DROP TRIGGER audit_chain_head_guard");
            }
            c.commit();
        }

        @Override
        public void close() throws Exception {
            try (Connection c = open(); Statement s = c.createStatement()) {
                s.execute("SHUTDOWN");
            } catch (SQLException ignored) {
                // already shut down by the test
            }
            try (Stream<Path> files = Files.walk(dir)) {
                files.sorted(Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
            }
        }
    }

    static final class Postgres extends TestDatabase {
        private final String schema = "audit_test_" + UUID.randomUUID().toString().replace("-", "").substring(0, 16);

        Postgres() throws SQLException {
            try (Connection c = connect(PG_URL, PG_USER, PG_PASSWORD); Statement s = c.createStatement()) {
                s.execute("CREATE SCHEMA " + schema);
            }
        }

        @Override
        String url() {
            return PG_URL + (PG_URL.contains("?") ? "&" : "?") + "currentSchema=" + schema;
        }

        @Override
        String user() {
            return PG_USER;
        }

        @Override
        String password() {
            return PG_PASSWORD;
        }

        @Override
        void dropTriggers(Connection c) throws SQLException {
            try (Statement s = c.createStatement()) {
                s.execute("ALTER TABLE audit_record DISABLE TRIGGER USER");
                s.execute("ALTER TABLE audit_chain_head DISABLE TRIGGER USER");
            }
            c.commit();
        }

        @Override
        public void close() throws SQLException {
            try (Connection c = connect(PG_URL, PG_USER, PG_PASSWORD); Statement s = c.createStatement()) {
                s.execute("DROP SCHEMA " + schema + " CASCADE");
            }
        }
    }
}
