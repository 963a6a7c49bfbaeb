package org.tracegas.store;

/** The lab's files and their analyses on the PostgreSQL server, in a fresh schema per test. */
class PostgresImportServiceTest extends ImportServiceContract {

    @Override
    TestBackend newBackend() throws Exception {
        return new PostgresBackend();
    }
}
