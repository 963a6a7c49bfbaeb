package org.tracegas.store;

import java.sql.Connection;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.Set;

import org.tracegas.model.AccessLevel;
import org.tracegas.model.Client;
import org.tracegas.model.ContentVersion;
import org.tracegas.model.Project;
import org.tracegas.model.Role;
import org.tracegas.model.VersionKind;

/**
 * A store on a fresh database with an analyst who owns a project, a reader with a read grant on it, and a
 * method and a library version to record results against.
 */
final class AnalysisFixture implements AutoCloseable {

    static final char[] ANALYST_PASSWORD = "ana-pw-1234".toCharArray();

    final TestBackend backend;
    final WorkspaceStore store;
    final Session analyst;
    final Session reader;
    final Project project;
    final ContentVersion method;
    final ContentVersion library;

    AnalysisFixture(TestBackend backend) {
        this.backend = backend;
        store = backend.open();
        Session admin = store.users().createFirstAdministrator("admin", "Administrator", "admin-pw-12".toCharArray());
        store.users().createUser(admin, "ana", "Ana Lyst", Set.of(Role.ANALYST), ANALYST_PASSWORD);
        store.users().createUser(admin, "rita", "Rita Reader", Set.of(Role.ANALYST), "rita-pw-1234".toCharArray());
        analyst = store.users().logIn("ana", ANALYST_PASSWORD);
        reader = store.users().logIn("rita", "rita-pw-1234".toCharArray());
        project = store.projects().createProject(analyst, store.projects().createClient(analyst, "Client").getId(),
                "WU-1",
                "Stack campaign");
        store.projects().grant(analyst, project.getId(), reader.userId(), AccessLevel.READ);
        method = store.versions().create(analyst, VersionKind.METHOD, "CO in flue gas", "analyte=CO\n", "first");
        library = store.versions().create(analyst, VersionKind.LIBRARY, "Kiln gases", "sha=abc\n", "first");
    }

    /** The single number a query returns. */
    long count(String sql) throws SQLException {
        try (Connection c = backend.raw(); Statement s = c.createStatement(); ResultSet rs = s.executeQuery(sql)) {
            rs.next();
            return rs.getLong(1);
        }
    }

    @Override
    public void close() throws Exception {
        try (TestBackend b = backend) {
            store.close();
        }
    }
}
