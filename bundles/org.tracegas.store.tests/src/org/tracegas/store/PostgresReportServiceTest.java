package org.tracegas.store;

/** The reports issued from a project on the PostgreSQL server, in a fresh schema per test. */
class PostgresReportServiceTest extends ReportServiceContract {

    @Override
    TestBackend newBackend() throws Exception {
        return new PostgresBackend();
    }
}
