package org.tracegas.store.internal;

import java.sql.Connection;
import java.sql.SQLException;
import javax.sql.DataSource;

import org.tracegas.store.StoreException;

/**
 * Runs each service operation in its own transaction on a fresh connection: commit when the work
 * returns, roll back when it throws, so that nothing is half written.
 */
final class Transactions {

    /** Work done inside one transaction. */
    @FunctionalInterface
    interface Work<T> {
        T run(Tx tx) throws SQLException;
    }

    private final DataSource dataSource;

    Transactions(DataSource dataSource) {
        this.dataSource = dataSource;
    }

    /**
     * @param operation what is done, for the error message
     * @throws StoreException wrapping a database failure; unchecked exceptions of the work pass unchanged
     */
    <T> T run(String operation, Work<T> work) {
        try (Connection c = dataSource.getConnection()) {
            c.setAutoCommit(false);
            try {
                T result = work.run(new Tx(c));
                c.commit();
                return result;
            } catch (SQLException | RuntimeException | Error e) {
                rollback(c, e);
                throw e;
            }
        } catch (SQLException e) {
            throw new StoreException(operation + " failed: " + sentence(e), e);
        }
    }

    /**
     * What went wrong, said for people where it can be foreseen. SQLSTATE 23505 is the unique-constraint
     * violation of the SQL standard, which both H2 and PostgreSQL report; the database's own text stays in the
     * cause.
     */
    static String sentence(SQLException e) {
        return "23505".equals(e.getSQLState()) ? "a record with the same name, code or number exists already"
                : e.getMessage();
    }

    /** A connection for a reader that outlives this call (a streamed query); the caller closes it. */
    Connection openReadConnection() throws SQLException {
        Connection c = dataSource.getConnection();
        // a PostgreSQL cursor (fetch size) works only inside a transaction
        c.setAutoCommit(false);
        c.setReadOnly(true);
        return c;
    }

    private static void rollback(Connection c, Throwable cause) {
        try {
            c.rollback();
        } catch (SQLException e) {
            cause.addSuppressed(e);
        }
    }
}
