package org.tracegas.audit.internal;

import java.sql.Connection;
import java.sql.SQLException;

/**
 * Runs read-only work in one transaction so that a cursor streams (PostgreSQL fetches by fetchSize only
 * outside auto-commit) and all reads see one snapshot. When the caller's connection is in auto-commit
 * mode a repeatable-read transaction is opened and ended here; otherwise the caller's transaction is used.
 */
public final class Snapshot {

    /** Work reading from the connection. */
    @FunctionalInterface
    public interface Work<T> {
        T run(Connection c) throws SQLException;
    }

    private Snapshot() {
    }

    public static <T> T read(Connection c, Work<T> work) throws SQLException {
        if (!c.getAutoCommit()) {
            return work.run(c);
        }
        int isolation = c.getTransactionIsolation();
        c.setAutoCommit(false);
        try {
            c.setTransactionIsolation(Connection.TRANSACTION_REPEATABLE_READ);
            T result = work.run(c);
            c.commit();
            return result;
        } catch (SQLException | RuntimeException e) {
            c.rollback();
            throw e;
        } finally {
            c.setTransactionIsolation(isolation);
            c.setAutoCommit(true);
        }
    }
}
