package org.tracegas.ui.session;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.ResultSet;
import java.sql.Statement;
import java.util.Map;
import java.util.UUID;

import org.eclipse.jface.preference.PreferenceStore;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.postgresql.ds.PGSimpleDataSource;
import org.tracegas.audit.AuditQuery;
import org.tracegas.audit.AuditReview;
import org.tracegas.store.Session;
import org.tracegas.store.StoreException;
import org.tracegas.ui.prefs.DeskPreferences;

/** The preferences choose the workspace: the lab server when a URL is set, else the local folder. */
class WorkspaceLocationTest {

    /** The local test server, as for the store's PostgreSQL contract tests. */
    private static final String PG_URL = System.getProperty("tracegas.test.pg.url",
            "jdbc:postgresql://127.0.0.1:55432/tracegas");
    private static final String PG_USER = System.getProperty("tracegas.test.pg.user", "tracegas");
    private static final String PG_PASSWORD = System.getProperty("tracegas.test.pg.password", "tracegas");

    @TempDir
    Path folder;

    private static PreferenceStore prefs(String url, String user) {
        PreferenceStore store = new PreferenceStore();
        DeskPreferences.setDefaults(store);
        store.setValue(DeskPreferences.SERVER_URL, url);
        store.setValue(DeskPreferences.SERVER_USER, user);
        return store;
    }

    @Test
    void withoutAServerUrlTheLocalFolderIsOpened() {
        PreferenceStore store = prefs("", "");
        store.setValue(DeskPreferences.WORKSPACE_FOLDER, folder.toString());
        WorkspaceLocation location = DeskPreferences.location(store, Map.of());
        assertEquals(new WorkspaceLocation.Folder(folder), location);
        assertEquals("local workspace in " + folder.toAbsolutePath(), location.description());
        try (WorkspaceAccess access = WorkspaceAccess.open(location)) {
            assertFalse(access.store().users().hasUsers());
        }
        // the database lies in db/ of the folder, where the runner looks for it too
        assertTrue(folder.resolve("db").resolve("workspace.mv.db").toFile().isFile());
    }

    @Test
    void aServerUrlNamesTheLabServerWithThePasswordFromTheEnvironmentAndNeverShowsIt() {
        WorkspaceLocation location = DeskPreferences.location(
                prefs("jdbc:postgresql://lab-db.example:5432/tracegas?sslmode=require&password=s3cret", "desk"),
                Map.of(DeskPreferences.SERVER_PASSWORD_VARIABLE, "from-env"));
        WorkspaceLocation.LabServer server = assertInstanceOf(WorkspaceLocation.LabServer.class, location);
        assertEquals("desk", server.user());
        assertEquals("from-env", server.password());
        assertEquals("lab server jdbc:postgresql://lab-db.example:5432/tracegas as desk", location.description());
        assertFalse(location.toString().contains("s3cret") || location.toString().contains("from-env"));
        assertThrows(IllegalArgumentException.class, () -> new WorkspaceLocation.LabServer("jdbc:h2:mem:x", "u", ""));
    }

    @Test
    void anUnreachableLabServerIsReportedAndNoLocalWorkspaceIsOpenedInstead() {
        // port 9 (discard) has no PostgreSQL behind it
        WorkspaceLocation server = DeskPreferences.location(prefs("jdbc:postgresql://127.0.0.1:9/tracegas", "desk"),
                Map.of());
        StoreException e = assertThrows(StoreException.class, () -> WorkspaceAccess.open(server).close());
        assertTrue(e.getMessage().contains("127.0.0.1:9"), e.getMessage());
    }

    @Test
    void theLabServerIsOpenedWhenThePreferencesSaySoAndTheAuditTrailIsReadFromTheSameDatabase() throws Exception {
        String schema = "desk_" + UUID.randomUUID().toString().replace("-", "");
        PGSimpleDataSource admin = new PGSimpleDataSource();
        admin.setURL(PG_URL);
        admin.setUser(PG_USER);
        admin.setPassword(PG_PASSWORD);
        try (Connection c = admin.getConnection(); Statement s = c.createStatement()) {
            s.execute("CREATE SCHEMA " + schema);
        }
        try {
            WorkspaceLocation location = DeskPreferences.location(prefs(PG_URL + "?currentSchema=" + schema, PG_USER),
                    Map.of(DeskPreferences.SERVER_PASSWORD_VARIABLE, PG_PASSWORD));
            try (WorkspaceAccess access = WorkspaceAccess.open(location)) {
                Session first = access.store().users().createFirstAdministrator("admin", "Administrator",
                        "lab-admin-pw".toCharArray());
                assertTrue(access.store().users().hasUsers());
                // the audit trail the desk reads through the store is the one in the lab server's schema
                AuditReview.Result trail = access.store().audit().review(first,
                        AuditQuery.all().user(first.userId()).build());
                assertTrue(trail.chain().intact());
                try (Connection c = admin.getConnection(); Statement s = c.createStatement();
                        ResultSet r = s.executeQuery("SELECT COUNT(*) FROM " + schema + ".audit_record")) {
                    assertTrue(r.next());
                    assertEquals(r.getLong(1), trail.chain().recordsChecked());
                    assertFalse(trail.records().isEmpty(), "creating the administrator is recorded");
                }
            }
        } finally {
            try (Connection c = admin.getConnection(); Statement s = c.createStatement()) {
                s.execute("DROP SCHEMA " + schema + " CASCADE");
            }
        }
    }
}
