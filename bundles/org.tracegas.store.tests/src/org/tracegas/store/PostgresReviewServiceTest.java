package org.tracegas.store;

/** Report signatures on the PostgreSQL server, in a fresh schema per test. */
class PostgresReviewServiceTest extends ReviewServiceContract {

    @Override
    TestBackend newBackend() throws Exception {
        return new PostgresBackend();
    }
}
