package org.tracegas.store;

import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;

/**
 * A contract whose every test runs on a fresh {@link AnalysisFixture}, on the backend its subclass opens (H2 file
 * or PostgreSQL server).
 */
abstract class AnalysisFixtureContract {

    AnalysisFixture f;

    abstract TestBackend newBackend() throws Exception;

    @BeforeEach
    void openFixture() throws Exception {
        f = new AnalysisFixture(newBackend());
    }

    @AfterEach
    void closeFixture() throws Exception {
        f.close();
    }
}
