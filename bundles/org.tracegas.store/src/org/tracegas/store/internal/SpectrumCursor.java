package org.tracegas.store.internal;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.util.Iterator;
import java.util.NoSuchElementException;
import java.util.Spliterator;
import java.util.Spliterators;
import java.util.stream.Stream;
import java.util.stream.StreamSupport;

import org.tracegas.model.ProcessedSpectrum;
import org.tracegas.store.StoreException;

/**
 * Spectra read lazily from an open result set: one row is decoded per {@link #next()}, and the driver
 * holds only its fetch-size window. Closing the stream closes result set, statement and connection.
 */
final class SpectrumCursor implements Iterator<ProcessedSpectrum>, AutoCloseable {

    /** Rows per round trip; enough to hide latency, small enough that memory stays flat. */
    static final int FETCH_SIZE = 200;

    private final Connection connection;
    private final PreparedStatement statement;
    private final ResultSet rows;
    private Boolean hasRow; // null: not yet advanced
    private boolean closed;

    private SpectrumCursor(Connection connection, PreparedStatement statement, ResultSet rows) {
        this.connection = connection;
        this.statement = statement;
        this.rows = rows;
    }

    /** Takes ownership of the connection and statement; the statement must be ready to execute. */
    static Stream<ProcessedSpectrum> stream(Connection connection, PreparedStatement statement) throws SQLException {
        statement.setFetchSize(FETCH_SIZE);
        SpectrumCursor cursor = new SpectrumCursor(connection, statement, statement.executeQuery());
        return StreamSupport.stream(Spliterators.spliteratorUnknownSize(cursor,
                Spliterator.ORDERED | Spliterator.NONNULL), false).onClose(cursor::close);
    }

    @Override
    public boolean hasNext() {
        if (hasRow == null) {
            try {
                hasRow = !closed && rows.next();
            } catch (SQLException e) {
                close();
                throw new StoreException("reading spectra failed: " + e.getMessage(), e);
            }
        }
        return hasRow;
    }

    @Override
    public ProcessedSpectrum next() {
        if (!hasNext()) {
            throw new NoSuchElementException("no more spectra");
        }
        hasRow = null;
        try {
            return SpectrumRows.read(rows);
        } catch (SQLException e) {
            close();
            throw new StoreException("reading spectra failed: " + e.getMessage(), e);
        }
    }

    @Override
    public void close() {
        if (closed) {
            return;
        }
        closed = true;
        try (connection; statement; rows) {
            connection.rollback(); // read-only: nothing to keep, and it ends the cursor's transaction
        } catch (SQLException e) {
            throw new StoreException("closing the spectrum cursor failed: " + e.getMessage(), e);
        }
    }
}
