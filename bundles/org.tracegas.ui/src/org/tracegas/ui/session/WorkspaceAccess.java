package org.tracegas.ui.session;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.SQLException;

import org.h2.jdbcx.JdbcDataSource;
import org.tracegas.store.WorkspaceStore;
import org.tracegas.store.Workspaces;

/**
 * An open workspace as the desk uses it: the store's services, and JDBC connections to the same database for
 * reading the audit trail and signing (the audit functions work on a connection in the caller's
 * transaction).
 */
public final class WorkspaceAccess implements AutoCloseable {

    private final Path folder;
    private final WorkspaceStore store;
    private final JdbcDataSource auditSource;

    private WorkspaceAccess(Path folder, WorkspaceStore store, JdbcDataSource auditSource) {
        this.folder = folder;
        this.store = store;
        this.auditSource = auditSource;
    }

    /**
     * Opens (or creates) the embedded workspace in {@code folder}; its database lives in {@code folder/db}, as
     * for the headless runner, so both open the same workspace folder.
     *
     * @throws org.tracegas.store.StoreException if the database cannot be opened
     */
    public static WorkspaceAccess openH2(Path folder) {
        Path database = folder.resolve("db");
        WorkspaceStore store = Workspaces.openH2(database);
        JdbcDataSource ds = new JdbcDataSource();
        // same URL and settings as the store uses, so this joins the database the store keeps open in this JVM
        ds.setURL("jdbc:h2:file:" + database.toAbsolutePath().resolve("workspace")
                + ";DB_CLOSE_DELAY=-1;LAZY_QUERY_EXECUTION=TRUE;LOCK_TIMEOUT=30000");
        return new WorkspaceAccess(folder, store, ds);
    }

    public WorkspaceStore store() {
        return store;
    }

    public Path folder() {
        return folder;
    }

    /** A new connection to the workspace database, in auto-commit mode; close it after use. */
    public Connection connection() throws SQLException {
        return auditSource.getConnection();
    }

    @Override
    public void close() {
        store.close();
    }
}
