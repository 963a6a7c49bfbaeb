package org.tracegas.store;

/** Work units on the PostgreSQL server, in a fresh schema per test. */
class PostgresWorkUnitServiceTest extends WorkUnitServiceContract {

    @Override
    TestBackend newBackend() throws Exception {
        return new PostgresBackend();
    }
}
