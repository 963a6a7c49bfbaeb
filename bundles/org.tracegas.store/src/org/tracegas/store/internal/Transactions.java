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
        Open<T> open = begin(operation, work);
        return open.commit(tx -> open.value());
    }

    /**
     * Runs the first part of a transaction and leaves it open, for {@link Open#commit} to finish, possibly on
     * another thread, or {@link Open#close} to roll back.
     *
     * @param operation what is done, for the error messages of both parts
     * @throws StoreException wrapping a database failure; unchecked exceptions of the work pass unchanged. Either
     *                        way the transaction is rolled back and its connection closed
     */
    <T> Open<T> begin(String operation, Work<T> work) {
        Connection c = null;
        try {
            c = dataSource.getConnection();
            c.setAutoCommit(false);
            Tx tx = new Tx(c);
            return new Open<>(operation, c, tx, work.run(tx));
        } catch (SQLException e) {
            abandon(c, e);
            throw new StoreException(operation + " failed: " + sentence(e), e);
        } catch (RuntimeException | Error e) {
            abandon(c, e);
            throw e;
        }
    }

    /**
     * A transaction whose first part ran: its value, and the connection kept open until it is committed or
     * rolled back. Used by one thread at a time.
     *
     * @param <T> what the first part returned
     */
    static final class Open<T> implements AutoCloseable {

        private final String operation;
        private final Connection connection;
        private final Tx tx;
        private final T value;
        private boolean ended;

        private Open(String operation, Connection connection, Tx tx, T value) {
            this.operation = operation;
            this.connection = connection;
            this.tx = tx;
            this.value = value;
        }

        T value() {
            return value;
        }

        /**
         * Runs the last part and commits; on any failure rolls back. The connection is closed either way.
         *
         * @throws IllegalStateException if the transaction ended already
         * @throws StoreException        wrapping a database failure
         */
        <R> R commit(Work<R> last) {
            if (ended) {
                throw new IllegalStateException(operation + ": the transaction was committed or rolled back already");
            }
            ended = true;
            R result;
            try {
                result = last.run(tx);
                connection.commit();
            } catch (SQLException e) {
                abandon(connection, e);
                throw new StoreException(operation + " failed: " + sentence(e), e);
            } catch (RuntimeException | Error e) {
                abandon(connection, e);
                throw e;
            }
            Transactions.close(connection, null);
            return result;
        }

        /** Rolls back unless committed; closes the connection. */
        @Override
        public void close() {
            if (ended) {
                return;
            }
            ended = true;
            try {
                connection.rollback();
            } catch (SQLException e) {
                throw new StoreException(operation + ": rolling back failed: " + sentence(e), e);
            } finally {
                Transactions.close(connection, null);
            }
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

    /** Rolls back and closes a connection, if one was opened; failures are added to the cause at hand. */
    private static void abandon(Connection c, Throwable cause) {
        if (c != null) {
            rollback(c, cause);
            close(c, cause);
        }
    }

    /** Closes a connection; a failure is added to the cause at hand, or else thrown. */
    private static void close(Connection c, Throwable cause) {
        try {
            c.close();
        } catch (SQLException e) {
            if (cause == null) {
                throw new StoreException("closing a connection failed: " + sentence(e), e);
            }
            cause.addSuppressed(e);
        }
    }

    private static void rollback(Connection c, Throwable cause) {
        try {
            c.rollback();
        } catch (SQLException e) {
            cause.addSuppressed(e);
        }
    }
}
