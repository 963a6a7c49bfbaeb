package org.tracegas.store;

import java.nio.file.Path;

import org.junit.jupiter.api.io.TempDir;

/** The store contract on an embedded H2 database file in a temporary folder. */
class H2WorkspaceStoreTest extends WorkspaceStoreContract {

    @TempDir
    Path folder;

    @Override
    TestBackend newBackend() {
        return new H2Backend(folder);
    }
}
