package org.tracegas.store.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.nio.file.Path;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;
import org.tracegas.store.Workspaces;

class WorkspaceStoreComponentTest {

    @TempDir
    Path folder;

    @Test
    void activationOpensTheConfiguredFolderAndDeactivationReleasesIt() {
        WorkspaceStoreComponent component = new WorkspaceStoreComponent();
        component.activate(Map.of("folder", folder.toString(), "maxFailedLogins", "3"));
        Session admin = component.users().createFirstAdministrator("admin", "Administrator",
                "admin-password".toCharArray());
        assertThrows(UnsupportedOperationException.class, component::close);
        component.deactivate();

        // the database file was released: a plain open of the same folder finds the same user
        try (WorkspaceStore store = Workspaces.openH2(folder)) {
            assertEquals(admin.userId(), store.users().logIn("admin", "admin-password".toCharArray()).userId());
        }
    }
}
