package org.tracegas.store;

import java.nio.file.Path;

import org.junit.jupiter.api.io.TempDir;

/** Sites, emission sources and a project's source on an embedded H2 database file. */
class H2SiteServiceTest extends SiteServiceContract {

    @TempDir
    Path folder;

    @Override
    TestBackend newBackend() {
        return new H2Backend(folder);
    }
}
