package org.tracegas.store;

/** QA checks on the PostgreSQL server, in a fresh schema per test. */
class PostgresQaServiceTest extends QaServiceContract {

    @Override
    TestBackend newBackend() throws Exception {
        return new PostgresBackend();
    }
}
