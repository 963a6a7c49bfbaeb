package org.tracegas.store;

import java.nio.file.Path;

import org.junit.jupiter.api.io.TempDir;

/** The audit trail through the store on an embedded H2 database file. */
class H2AuditServiceTest extends AuditServiceContract {

    @TempDir
    Path folder;

    @Override
    TestBackend newBackend() {
        return new H2Backend(folder);
    }
}
