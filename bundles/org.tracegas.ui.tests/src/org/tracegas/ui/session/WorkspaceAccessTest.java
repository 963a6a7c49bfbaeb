package org.tracegas.ui.session;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.store.StoreException;
import org.tracegas.store.WorkspaceStore;
import org.tracegas.store.Workspaces;

/** The workbench opens only workspaces that exist; it creates neither a workspace nor users of its own. */
class WorkspaceAccessTest {

    @TempDir
    Path folder;

    @Test
    void emptyFolderIsRefusedWithWhatToRunAndLeftEmpty() throws Exception {
        StoreException e = assertThrows(StoreException.class,
                () -> WorkspaceAccess.openExisting(new WorkspaceLocation.Folder(folder)));
        assertTrue(e.getMessage().contains(folder.toString()) && e.getMessage().contains("workspace-init")
                && e.getMessage().contains("demo"), e.getMessage());
        try (var files = Files.list(folder)) {
            assertEquals(0, files.count(), "nothing is created");
        }
    }

    @Test
    void workspaceWithoutUsersIsRefusedAndGetsNone() {
        Workspaces.openH2(folder.resolve("db")).close();
        StoreException e = assertThrows(StoreException.class,
                () -> WorkspaceAccess.openExisting(new WorkspaceLocation.Folder(folder)));
        assertTrue(e.getMessage().contains("no users") && e.getMessage().contains("workspace-init"), e.getMessage());
        try (WorkspaceStore store = Workspaces.openH2(folder.resolve("db"))) {
            assertTrue(!store.users().hasUsers(), "no administrator or demo user was seeded");
        }
    }

    @Test
    void workspaceWithUsersOpens() {
        try (WorkspaceAccess made = WorkspaceAccess.openH2(folder)) {
            new ExistingWorkspace(made.store());
        }
        try (WorkspaceAccess access = WorkspaceAccess.openExisting(new WorkspaceLocation.Folder(folder))) {
            assertTrue(access.store().users().hasUsers());
        }
    }
}
