package org.tracegas.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.sql.Connection;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.List;
import java.util.Set;
import java.util.UUID;

import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.postgresql.ds.PGSimpleDataSource;
import org.tracegas.model.Client;
import org.tracegas.model.ContentVersion;
import org.tracegas.model.MeasurementKind;
import org.tracegas.model.Project;
import org.tracegas.model.QaOutcomes;
import org.tracegas.model.Role;
import org.tracegas.model.VersionKind;

/**
 * On the real PostgreSQL server: a schema owned by an owner role, everyday work done as a second role with the
 * rights {@link LabServerRoles} grants. The store's services all work as the everyday role; changing or
 * deleting stored data or audit records, or the schema, through the same role's own connection is refused by
 * the server. Roles are made by the server's superuser (system property tracegas.test.pg.admin, default
 * "postgres"), as a lab's database administrator would.
 */
class LabServerRolesTest {

    private static final String URL = System.getProperty("tracegas.test.pg.url",
            "jdbc:postgresql://127.0.0.1:55432/tracegas");
    private static final String ADMIN = System.getProperty("tracegas.test.pg.admin", "postgres");
    private static final String ADMIN_PASSWORD = System.getProperty("tracegas.test.pg.admin.password", "");

    private final String suffix = UUID.randomUUID().toString().replace("-", "").substring(0, 12);
    private final String owner = "owner_" + suffix;
    private final String everyday = "work_" + suffix;
    private final String schema = "roles_" + suffix;
    private final String url = URL + (URL.contains("?") ? "&" : "?") + "currentSchema=" + schema;

    @BeforeEach
    void roles() throws SQLException {
        try (Connection c = connect(URL, ADMIN, ADMIN_PASSWORD); Statement s = c.createStatement()) {
            s.execute("CREATE ROLE " + owner + " LOGIN PASSWORD 'owner-pw-" + suffix + "'");
            s.execute("CREATE ROLE " + everyday + " LOGIN PASSWORD 'work-pw-" + suffix + "'");
            s.execute("CREATE SCHEMA " + schema + " AUTHORIZATION " + owner);
        }
    }

    @AfterEach
    void drop() throws SQLException {
        try (Connection c = connect(URL, ADMIN, ADMIN_PASSWORD); Statement s = c.createStatement()) {
            s.execute("DROP SCHEMA " + schema + " CASCADE");
            s.execute("DROP OWNED BY " + everyday + ", " + owner);
            s.execute("DROP ROLE " + everyday);
            s.execute("DROP ROLE " + owner);
        }
    }

    @Test
    void everydayWorkSucceedsButStoredDataAndAuditRecordsCannotBeChangedOrDeleted() throws Exception {
        Workspaces.openPostgres(url, owner, "owner-pw-" + suffix).close();
        try (Connection c = connect(url, owner, "owner-pw-" + suffix)) {
            LabServerRoles.grantEverydayWork(c, everyday);
        }
        String work = "work-pw-" + suffix;
        try (WorkspaceStore store = Workspaces.openPostgres(url, everyday, work)) {
            Session admin = store.users().createFirstAdministrator("admin", "Administrator", "admin-pw-12".toCharArray());
            store.users().createUser(admin, "ana", "Ana Lyst", Set.of(Role.ANALYST), "ana-pw-1234".toCharArray());
            Session ana = store.users().logIn("ana", "ana-pw-1234".toCharArray());
            Project p = store.projects().createProject(ana, store.projects().createClient(ana, "Client").getId(), "R-1",
                    "Roles");
            store.projects().rename(ana, p.getId(), p.getRowVersion(), "Roles, renamed");
            ContentVersion method = store.versions().create(ana, VersionKind.METHOD, "m", "analyte=CO\n", "first");
            ContentVersion library = store.versions().create(ana, VersionKind.LIBRARY, "l", "sha=abc\n", "first");
            store.blocks().store(ana, p.getId(), SampleBlocks.block(0, 2, 2, method.getId(), library.getId()));
            store.qa().recordAll(ana, p.getId(), method.getId(), List.of(QaOutcomes.of("Noise level", true, 0.001,
                    "absorbance", Double.NEGATIVE_INFINITY, 0.002, "RMS <= 0.002", "common practice, no source")));
            store.projects().recordMeasurement(ana, p.getId(), MeasurementKind.BACKGROUND, SampleBlocks.START, 438.15,
                    1013.0);
            assertTrue(store.audit().verifyWorkspace(List.of()).intact());
        }
        try (Connection c = connect(url, everyday, work); Statement s = c.createStatement()) {
            for (String sql : List.of("UPDATE analysis_result SET concentration = concentration / 2",
                    "DELETE FROM analysis_result", "UPDATE measurement SET cell_pressure = 900",
                    "DELETE FROM measurement", "UPDATE spectral_data SET value_data = axis_values",
                    "UPDATE qa_check SET passed = TRUE", "DELETE FROM qa_check",
                    "UPDATE report SET content_sha256 = content_sha256", "DELETE FROM report", "UPDATE app_user SET login = 'x'",
                    "DELETE FROM app_user", "UPDATE data_binding SET row_sha256 = row_sha256",
                    "DELETE FROM data_binding", "UPDATE audit_record SET user_id = 'x'", "DELETE FROM audit_record",
                    "TRUNCATE audit_record", "TRUNCATE analysis_result",
                    "ALTER TABLE audit_record DISABLE TRIGGER USER", "DROP TRIGGER audit_record_append_only ON audit_record",
                    "ALTER TABLE analysis_result ADD COLUMN note TEXT")) {
                SQLException e = assertThrows(SQLException.class, () -> s.execute(sql), sql);
                assertEquals("42501", e.getSQLState(), sql + ": " + e.getMessage());
            }
        }
    }

    private static Connection connect(String url, String user, String password) throws SQLException {
        PGSimpleDataSource ds = new PGSimpleDataSource();
        ds.setURL(url);
        ds.setUser(user);
        ds.setPassword(password);
        return ds.getConnection();
    }
}
