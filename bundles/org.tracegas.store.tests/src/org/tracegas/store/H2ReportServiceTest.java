package org.tracegas.store;

import java.nio.file.Path;

import org.junit.jupiter.api.io.TempDir;

/** The reports issued from a project on an embedded H2 database file. */
class H2ReportServiceTest extends ReportServiceContract {

    @TempDir
    Path folder;

    @Override
    TestBackend newBackend() {
        return new H2Backend(folder);
    }
}
