package org.tracegas.store;

import java.nio.file.Path;

import org.junit.jupiter.api.io.TempDir;

/** Work units on an embedded H2 database file, runners as threads of one process. */
class H2WorkUnitServiceTest extends WorkUnitServiceContract {

    @TempDir
    Path folder;

    @Override
    TestBackend newBackend() {
        return new H2Backend(folder);
    }
}
