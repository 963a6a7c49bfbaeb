package org.tracegas.store;

/** Blocks of processed spectra on the PostgreSQL server, in a fresh schema per test. */
class PostgresBlockServiceTest extends BlockServiceContract {

    @Override
    TestBackend newBackend() throws Exception {
        return new PostgresBackend();
    }
}
