package org.tracegas.store;

import java.nio.file.Path;

import org.junit.jupiter.api.io.TempDir;

/** The lab's instruments and the instrument of a measurement on an embedded H2 database file. */
class H2InstrumentServiceTest extends InstrumentServiceContract {

    @TempDir
    Path folder;

    @Override
    TestBackend newBackend() {
        return new H2Backend(folder);
    }
}
