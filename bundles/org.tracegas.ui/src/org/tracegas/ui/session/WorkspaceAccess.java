package org.tracegas.ui.session;

import java.nio.file.Files;
import java.nio.file.Path;

import org.tracegas.store.StoreException;
import org.tracegas.store.WorkspaceStore;
import org.tracegas.store.Workspaces;

/**
 * An open workspace as the desk uses it: where it is, and the store's services, through which the desk reads
 * and changes everything (the audit trail and signatures included), as the runner does.
 */
public final class WorkspaceAccess implements AutoCloseable {

    private final WorkspaceLocation location;
    private final WorkspaceStore store;

    private WorkspaceAccess(WorkspaceLocation location, WorkspaceStore store) {
        this.location = location;
        this.store = store;
    }

    /**
     * Opens (or creates) the workspace at {@code location}: the embedded database of a folder, or the lab
     * server, whose schema is created or migrated on opening.
     *
     * @throws org.tracegas.store.StoreException if the database cannot be opened or reached
     */
    public static WorkspaceAccess open(WorkspaceLocation location) {
        if (location instanceof WorkspaceLocation.LabServer server) {
            return new WorkspaceAccess(location,
                    Workspaces.openPostgres(server.url(), server.user(), server.password()));
        }
        Path database = ((WorkspaceLocation.Folder) location).folder().resolve("db");
        return new WorkspaceAccess(location, Workspaces.openH2(database));
    }

    /**
     * Opens a workspace that exists and has its administrator, as the workbench does at start. The workbench
     * never creates a workspace or users of its own (no built-in passwords): an empty folder needs
     * {@code tracegas workspace-init}, and the demo's workspace comes from {@code tracegas demo}.
     *
     * @throws StoreException naming the folder and what to run, or if the database cannot be opened
     */
    public static WorkspaceAccess openExisting(WorkspaceLocation location) {
        String create = "create one with 'tracegas workspace-init', which makes its first administrator, or run "
                + "'releng/demo.sh' and start the workbench on workspace-data/demo";
        if (location instanceof WorkspaceLocation.Folder folder
                && !Files.isRegularFile(folder.folder().resolve("db").resolve("workspace.mv.db"))) {
            throw new StoreException("there is no workspace in " + folder.folder() + "; " + create);
        }
        WorkspaceAccess access = open(location);
        if (!access.store().users().hasUsers()) {
            access.close();
            throw new StoreException("the " + location.description() + " has no users yet; " + create);
        }
        return access;
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

    @Override
    public void close() {
        store.close();
    }
}
