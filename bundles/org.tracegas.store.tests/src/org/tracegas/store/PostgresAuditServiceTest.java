package org.tracegas.store;

/** The audit trail through the store on the PostgreSQL server, in a fresh schema per test. */
class PostgresAuditServiceTest extends AuditServiceContract {

    @Override
    TestBackend newBackend() throws Exception {
        return new PostgresBackend();
    }
}
