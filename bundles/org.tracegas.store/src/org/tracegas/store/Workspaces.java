package org.tracegas.store;

import java.nio.file.Path;

import org.tracegas.store.internal.JdbcWorkspaceStore;

/** Opens workspace stores outside OSGi (tests, the headless runner). */
public final class Workspaces {

    private Workspaces() {
    }

    /**
     * The embedded default: an H2 database in a local folder, no set-up needed.
     *
     * @throws StoreException if the database cannot be opened or migrated
     */
    public static WorkspaceStore openH2(Path folder) {
        return JdbcWorkspaceStore.openH2(folder, JdbcWorkspaceStore.DEFAULT_MAX_FAILED_LOGINS);
    }

    /**
     * A lab server. The schema is created or migrated on opening.
     *
     * @param url a {@code jdbc:postgresql:} URL
     * @throws StoreException if the database cannot be reached or migrated
     */
    public static WorkspaceStore openPostgres(String url, String user, String password) {
        return JdbcWorkspaceStore.openPostgres(url, user, password, JdbcWorkspaceStore.DEFAULT_MAX_FAILED_LOGINS);
    }
}
