package org.tracegas.store;

/** The store contract on the PostgreSQL server, in a fresh schema per test. */
class PostgresWorkspaceStoreTest extends WorkspaceStoreContract {

    @Override
    TestBackend newBackend() throws Exception {
        return new PostgresBackend();
    }
}
