package org.tracegas.store;

import java.util.List;

/**
 * A block inserted by {@link BlockService#insert} in a transaction still open: its rows are written but seen by
 * nobody else, and its audit records are not appended yet. It is committed or rolled back once, on any one
 * thread at a time, so that a batch inserts the next block while this one commits.
 */
public interface UncommittedBlock extends AutoCloseable {

    /** The processed spectra it holds. */
    int size();

    /**
     * Appends the block's audit records, binding its rows, and commits: all of it or, on any failure, nothing.
     * Blocks committed one after another get their audit records in that order.
     *
     * @return what was created, one entry per processed spectrum in input order
     * @throws IllegalStateException if the block was committed or rolled back already
     * @throws StoreException        if the database refuses; the block is then rolled back
     */
    List<StoredMeasurement> commit();

    /** Rolls the block back unless it was committed, and gives up its connection. Repeated calls do nothing. */
    @Override
    void close();
}
