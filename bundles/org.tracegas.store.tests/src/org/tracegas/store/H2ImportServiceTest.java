package org.tracegas.store;

import java.nio.file.Path;

import org.junit.jupiter.api.io.TempDir;

/** The lab's files and their analyses on an embedded H2 database file. */
class H2ImportServiceTest extends ImportServiceContract {

    @TempDir
    Path folder;

    @Override
    TestBackend newBackend() {
        return new H2Backend(folder);
    }
}
