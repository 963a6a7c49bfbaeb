package org.tracegas.campaign;

import java.util.ArrayList;
import java.util.List;

import org.tracegas.quantify.ProgressListener;
import org.tracegas.store.ProcessedSpectrum;

/**
 * Collects processed spectra and hands them to a sink in blocks of a fixed size (the last one may be
 * smaller). Progress is told after each block the sink accepted, so what it reports is stored. Not
 * thread-safe: the batch delivers results on one thread.
 */
final class BlockBuffer {

    /** Stores one block, all of it or nothing. */
    @FunctionalInterface
    interface Sink {
        void store(List<ProcessedSpectrum> block);
    }

    private final int blockSize;
    private final Sink sink;
    private final ProgressListener progress;
    private final long total;
    private final List<ProcessedSpectrum> pending;
    private long stored;
    private boolean failed;

    /**
     * @param total number of spectra expected, for the progress listener, or -1 if not known
     * @throws IllegalArgumentException if the block size is below 1
     */
    BlockBuffer(int blockSize, Sink sink, ProgressListener progress, long total) {
        if (blockSize < 1) {
            throw new IllegalArgumentException("blockSize must be at least 1, was " + blockSize);
        }
        this.blockSize = blockSize;
        this.sink = sink;
        this.progress = progress;
        this.total = total;
        this.pending = new ArrayList<>(blockSize);
    }

    /** Adds a spectrum; stores the block when it is full. */
    void add(ProcessedSpectrum spectrum) {
        pending.add(spectrum);
        if (pending.size() == blockSize) {
            flush();
        }
    }

    /**
     * Stores what is pending. A block the sink refused is neither retried nor dropped silently: the sink's
     * exception propagates and {@link #failed()} turns true.
     */
    void flush() {
        if (pending.isEmpty()) {
            return;
        }
        try {
            sink.store(List.copyOf(pending));
        } catch (RuntimeException e) {
            failed = true;
            throw e;
        }
        stored += pending.size();
        pending.clear();
        progress.progress(stored, total);
    }

    /** Spectra stored so far. */
    long stored() {
        return stored;
    }

    /** Whether the sink refused a block. */
    boolean failed() {
        return failed;
    }
}
