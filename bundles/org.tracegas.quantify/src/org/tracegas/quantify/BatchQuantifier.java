package org.tracegas.quantify;

import java.util.ArrayDeque;
import java.util.Iterator;
import java.util.Spliterator;
import java.util.Spliterators;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.Future;
import java.util.concurrent.LinkedBlockingQueue;
import java.util.concurrent.ThreadPoolExecutor;
import java.util.concurrent.TimeUnit;
import java.util.function.BiFunction;
import java.util.function.Consumer;

/**
 * Quantifies a stream of samples on a fixed pool of threads and delivers the results in input order on the
 * calling thread. Each spectrum is fitted on its own by the same code, so the numbers are bit-identical whatever
 * the thread count. At most a few samples per thread are read ahead, so streams of any length fit in memory.
 * <p>
 * The pool is the quantifier's own and serves all its runs: its threads start with the first run and end after
 * they have idled for {@link #IDLE_SECONDS}, so nothing needs closing, and runs that follow each other (the batch
 * path runs one per work unit, a file) neither start threads nor make the workers' per-thread fit and transform
 * buffers anew. Runs at the same time share the threads.
 */
public final class BatchQuantifier {

    private static final int READ_AHEAD_PER_THREAD = 4;

    /** Seconds a worker idles before it ends: longer than the gap between two work units of a running batch. */
    static final long IDLE_SECONDS = 30;

    private final Quantifier quantifier;
    private final int threads;
    private final ThreadPoolExecutor pool;

    /**
     * @param quantifier the quantifier
     * @param threads    worker threads, at least 1
     */
    public BatchQuantifier(Quantifier quantifier, int threads) {
        if (quantifier == null) {
            throw new IllegalArgumentException("quantifier must not be null");
        }
        if (threads < 1) {
            throw new IllegalArgumentException("threads must be at least 1, was " + threads);
        }
        this.quantifier = quantifier;
        this.threads = threads;
        this.pool = new ThreadPoolExecutor(threads, threads, IDLE_SECONDS, TimeUnit.SECONDS,
                new LinkedBlockingQueue<>(), r -> {
                    Thread t = new Thread(r, "quantification worker");
                    t.setDaemon(true);
                    return t;
                });
        pool.allowCoreThreadTimeOut(true);
    }

    /** A batch quantifier on all available processors. */
    public static BatchQuantifier onAllCores(Quantifier quantifier) {
        return new BatchQuantifier(quantifier, Runtime.getRuntime().availableProcessors());
    }

    /** As {@link #run(Iterator, long, Consumer, ProgressListener, CancellationFlag)}, total from the spliterator. */
    public BatchOutcome run(Spliterator<Sample> samples, Consumer<? super SpectrumResult> consumer,
            ProgressListener progress, CancellationFlag cancellation) {
        return run(Spliterators.iterator(samples), samples.getExactSizeIfKnown(), consumer, progress, cancellation);
    }

    /**
     * Quantifies the samples. The consumer and the progress listener are called on the calling thread, in input
     * order. Once the flag is set no further result is delivered; those delivered are the first ones in order.
     *
     * @param samples      the samples
     * @param total        number of samples for the progress listener, or -1 if not known
     * @param consumer     receives each result
     * @param progress     told after each delivered result
     * @param cancellation checked before each spectrum is fitted and before each result is delivered
     * @return how many results were delivered and whether the batch was cancelled
     * @throws IllegalArgumentException if a sample cannot be quantified; the message names its index (from 0) and
     *                                  the results before it have been delivered
     */
    public BatchOutcome run(Iterator<Sample> samples, long total, Consumer<? super SpectrumResult> consumer,
            ProgressListener progress, CancellationFlag cancellation) {
        return map(samples, total, Quantifier::quantify, consumer, progress, cancellation);
    }

    /**
     * As {@link #run(Iterator, long, Consumer, ProgressListener, CancellationFlag)} for items that become
     * samples only on the worker threads: the calling thread just takes the items from the iterator, and a
     * worker turns each item into what the consumer receives, fitting it with the quantifier on the way. So
     * making a sample (transforming an interferogram, ratioing it) and making what is kept of its result run
     * on all cores, not on the one thread that reads.
     *
     * @param items        the items, e.g. recorded interferograms
     * @param total        number of items for the progress listener, or -1 if not known
     * @param work         turns one item into its outcome, never null; called on several threads at once
     * @param consumer     receives each outcome, on the calling thread, in input order
     * @param progress     told after each delivered outcome
     * @param cancellation checked before each item is worked on and before each outcome is delivered
     * @return how many outcomes were delivered and whether the batch was cancelled
     * @throws IllegalArgumentException if an item cannot be quantified; the message names its index (from 0) and
     *                                  the outcomes before it have been delivered
     */
    public <T, R> BatchOutcome map(Iterator<T> items, long total, BiFunction<Quantifier, ? super T, ? extends R> work,
            Consumer<? super R> consumer, ProgressListener progress, CancellationFlag cancellation) {
        ArrayDeque<Future<R>> pending = new ArrayDeque<>();
        long submitted = 0;
        long delivered = 0;
        try {
            while (true) {
                while (pending.size() < threads * READ_AHEAD_PER_THREAD && !cancellation.isCancelled()
                        && items.hasNext()) {
                    T item = items.next();
                    long index = submitted++;
                    pending.add(pool.submit(() -> cancellation.isCancelled() ? null : work(work, item, index)));
                }
                if (pending.isEmpty() || cancellation.isCancelled()) {
                    return new BatchOutcome(delivered, cancellation.isCancelled());
                }
                R outcome = await(pending.poll());
                if (outcome == null || cancellation.isCancelled()) {
                    return new BatchOutcome(delivered, true);
                }
                consumer.accept(outcome);
                delivered++;
                progress.progress(delivered, total);
            }
        } finally {
            // what is still queued or running of this run is dropped, its running items interrupted; the pool
            // stays for the next run
            pending.forEach(f -> f.cancel(true));
        }
    }

    private <T, R> R work(BiFunction<Quantifier, ? super T, ? extends R> work, T item, long index) {
        try {
            return work.apply(quantifier, item);
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException("sample " + index + ": " + e.getMessage(), e);
        }
    }

    private static <R> R await(Future<R> future) {
        try {
            return future.get();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("interrupted while waiting for a quantification result", e);
        } catch (ExecutionException e) {
            if (e.getCause() instanceof RuntimeException r) {
                throw r;
            }
            throw new IllegalStateException(e.getCause());
        }
    }
}
