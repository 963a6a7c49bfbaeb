package org.tracegas.store;

/** Sites, emission sources and a project's source on the PostgreSQL server, in a fresh schema per test. */
class PostgresSiteServiceTest extends SiteServiceContract {

    @Override
    TestBackend newBackend() throws Exception {
        return new PostgresBackend();
    }
}
