package org.tracegas.store;

import java.sql.Connection;
import java.sql.SQLException;

/** A real database for one test: opens the store on it and gives a raw connection for checks. */
interface TestBackend extends AutoCloseable {

    WorkspaceStore open();

    /** A separate connection to the same database, auto-commit on, for looking at what was stored. */
    Connection raw() throws SQLException;

    /** Drops what the test created. */
    @Override
    void close() throws SQLException;
}
