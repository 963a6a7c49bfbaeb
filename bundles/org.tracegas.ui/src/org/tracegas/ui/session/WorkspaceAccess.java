package org.tracegas.ui.session;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.SQLException;

import javax.sql.DataSource;

import org.h2.jdbcx.JdbcDataSource;
import org.postgresql.ds.PGSimpleDataSource;
import org.tracegas.store.WorkspaceStore;
import org.tracegas.store.Workspaces;

/**
 * An open workspace as the desk uses it: the store's services, and JDBC connections to the same database for
 * reading the audit trail and signing (the audit functions work on a connection in the caller's
 * transaction).
 */
public final class WorkspaceAccess implements AutoCloseable {

    private final WorkspaceLocation location;
    private final WorkspaceStore store;
    private final DataSource auditSource;

    private WorkspaceAccess(WorkspaceLocation location, WorkspaceStore store, DataSource auditSource) {
        this.location = location;
        this.store = store;
        this.auditSource = auditSource;
    }

    /**
     * Opens (or creates) the workspace at {@code location}: the embedded database of a folder, or the lab
     * server, whose schema is created or migrated on opening.
     *
     * @throws org.tracegas.store.StoreException if the database cannot be opened or reached
     */
    public static WorkspaceAccess open(WorkspaceLocation location) {
        if (location instanceof WorkspaceLocation.LabServer server) {
            WorkspaceStore store = Workspaces.openPostgres(server.url(), server.user(), server.password());
            PGSimpleDataSource ds = new PGSimpleDataSource();
            ds.setURL(server.url());
            ds.setUser(server.user());
            ds.setPassword(server.password());
            return new WorkspaceAccess(location, store, ds);
        }
        Path database = ((WorkspaceLocation.Folder) location).folder().resolve("db");
        WorkspaceStore store = Workspaces.openH2(database);
        JdbcDataSource ds = new JdbcDataSource();
        // the store offers no connection of its own: join the database it keeps open in this JVM with the
        // same URL and settings
        ds.setURL("jdbc:h2:file:" + database.toAbsolutePath().resolve("workspace")
                + ";DB_CLOSE_DELAY=-1;LAZY_QUERY_EXECUTION=TRUE;LOCK_TIMEOUT=30000;CACHE_SIZE=16384;WRITE_DELAY=0");
        return new WorkspaceAccess(location, store, ds);
    }

    /** Opens (or creates) the embedded workspace in {@code folder} (database in {@code folder/db}). */
    public static WorkspaceAccess openH2(Path folder) {
        return open(new WorkspaceLocation.Folder(folder));
    }

    public WorkspaceStore store() {
        return store;
    }

    public WorkspaceLocation location() {
        return location;
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
