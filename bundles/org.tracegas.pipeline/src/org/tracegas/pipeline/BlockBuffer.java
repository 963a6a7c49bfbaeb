package org.tracegas.pipeline;

import java.util.ArrayList;
import java.util.List;
import java.util.Queue;
import java.util.concurrent.ArrayBlockingQueue;
import java.util.concurrent.BlockingQueue;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.CompletionException;
import java.util.concurrent.ConcurrentLinkedQueue;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;

import org.tracegas.quantify.ProgressListener;
import org.tracegas.store.ProcessedSpectrum;

/**
 * Collects processed spectra into blocks of the block size (the first few smaller, growing to it; the last one
 * may be smaller) and stores them behind
 * the caller's back, so that the batch reads and fits the next block while one is being written: each full
 * block is encoded on an encoding thread and then stored, block after block in order, by one storage thread
 * fed by a short queue. A block the sink refuses stops the storing: the blocks queued after it are dropped, so what
 * is stored is always the first blocks in order, and the refusal is thrown to the caller. Progress is told
 * on the caller's thread, once per stored block, so what it reports is stored. Not thread-safe: the batch
 * delivers results on one thread.
 *
 * @param <E> a block as encoded for storing
 */
final class BlockBuffer<E> implements AutoCloseable {

    /** Stores blocks in two steps, so that the first can run apart from the database work. */
    interface Sink<E> {

        /** Makes a block ready for storing; called on the encoding thread, ahead of the block's turn. */
        E encode(List<ProcessedSpectrum> block);

        /** Stores one encoded block, all of it or nothing; called on the storage thread, in order. */
        void store(E block);
    }

    /**
     * The first block holds this fraction of the block size, each next one twice as many up to the block size:
     * storing starts once a few spectra are fitted rather than a whole block (where storing is the bound, the
     * time to fit the first block is added to the whole run), while nearly all spectra of a long run still go in
     * full blocks.
     */
    private static final int FIRST_BLOCK_DIVISOR = 8;

    /** Blocks encoded or being encoded that wait for the storage thread: few, so memory stays bounded. */
    private static final int QUEUED_BLOCKS = 2;

    /** A block handed to the storage thread: its encoding and its size. */
    private record Queued<E>(CompletableFuture<E> encoded, int size) {
    }

    private final int blockSize;
    /** Size of the block being filled: the first ones are smaller, so that storing starts early. */
    private int filling;
    private final Sink<E> sink;
    private final ProgressListener progress;
    private final long total;
    private final List<ProcessedSpectrum> pending;
    private final BlockingQueue<Queued<E>> queue = new ArrayBlockingQueue<>(QUEUED_BLOCKS);
    /** Sizes of the blocks stored and not yet told, in order. */
    private final Queue<Integer> storedBlocks = new ConcurrentLinkedQueue<>();
    private final ExecutorService encoder = Executors.newSingleThreadExecutor(r -> {
        Thread t = new Thread(r, "block encoding");
        t.setDaemon(true);
        return t;
    });
    private final Thread writer;
    private volatile RuntimeException failure;
    private boolean ended;
    private long stored;

    /**
     * Starts the encoding and the storage thread.
     *
     * @param total number of spectra expected, for the progress listener, or -1 if not known
     * @throws IllegalArgumentException if the block size is below 1
     */
    BlockBuffer(int blockSize, Sink<E> sink, ProgressListener progress, long total) {
        if (blockSize < 1) {
            throw new IllegalArgumentException("blockSize must be at least 1, was " + blockSize);
        }
        this.blockSize = blockSize;
        this.filling = Math.max(1, blockSize / FIRST_BLOCK_DIVISOR);
        this.sink = sink;
        this.progress = progress;
        this.total = total;
        this.pending = new ArrayList<>(blockSize);
        writer = new Thread(this::write, "block storage");
        writer.setDaemon(true);
        writer.start();
    }

    /**
     * Adds a spectrum; hands the block to storage when it is full.
     *
     * @throws RuntimeException the refusal of an earlier block by the sink
     */
    void add(ProcessedSpectrum spectrum) {
        if (ended) {
            throw new IllegalStateException("spectrum: the buffer is finished, it stores nothing more");
        }
        tell();
        requireNoFailure();
        pending.add(spectrum);
        if (pending.size() == filling) {
            handOver();
            filling = Math.min(blockSize, 2 * filling);
        }
    }

    /**
     * Stores what is pending and waits until every block handed over is stored. A block the sink refused is
     * neither retried nor dropped silently: the sink's exception is thrown and {@link #failed()} turns true.
     */
    void finish() {
        if (!ended && !pending.isEmpty() && failure == null) {
            handOver();
        }
        end();
        tell();
        requireNoFailure();
    }

    /** Spectra stored and told so far. */
    long stored() {
        return stored;
    }

    /** Whether the sink refused a block. */
    boolean failed() {
        return failure != null;
    }

    /** Stops the threads after the blocks handed over, waiting for them; pending spectra are not stored. */
    @Override
    public void close() {
        end();
    }

    private void handOver() {
        List<ProcessedSpectrum> block = List.copyOf(pending);
        pending.clear();
        put(new Queued<>(CompletableFuture.supplyAsync(() -> sink.encode(block), encoder),
                block.size()));
    }

    private void end() {
        if (ended) {
            return;
        }
        ended = true;
        put(new Queued<>(null, 0));
        boolean interrupted = false;
        while (writer.isAlive()) {
            try {
                writer.join();
            } catch (InterruptedException e) {
                // a block being written is one transaction: let it end, then keep the interrupt
                interrupted = true;
            }
        }
        encoder.shutdown();
        if (interrupted) {
            Thread.currentThread().interrupt();
        }
    }

    /** Queues for the storage thread, which always takes (dropping blocks after a failure), so this returns. */
    private void put(Queued<E> block) {
        boolean interrupted = false;
        while (true) {
            try {
                queue.put(block);
                break;
            } catch (InterruptedException e) {
                interrupted = true;
            }
        }
        if (interrupted) {
            Thread.currentThread().interrupt();
        }
    }

    /** The storage thread: stores the queued blocks in order until the end mark. */
    private void write() {
        while (true) {
            Queued<E> next;
            try {
                next = queue.take();
            } catch (InterruptedException e) {
                continue; // only end() stops this thread, so no handed-over block is left in doubt
            }
            if (next.encoded() == null) {
                return;
            }
            if (failure != null) {
                continue;
            }
            try {
                sink.store(next.encoded().join());
                storedBlocks.add(next.size());
            } catch (CompletionException e) {
                failure = e.getCause() instanceof RuntimeException r ? r : e;
            } catch (RuntimeException e) {
                failure = e;
            }
        }
    }

    private void tell() {
        Integer size;
        while ((size = storedBlocks.poll()) != null) {
            stored += size;
            progress.progress(stored, total);
        }
    }

    private void requireNoFailure() {
        RuntimeException f = failure;
        if (f != null) {
            throw f;
        }
    }
}
