package org.tracegas.pipeline.shared;

import java.time.Duration;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.Executors;
import java.util.concurrent.ScheduledExecutorService;
import java.util.concurrent.ScheduledFuture;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.concurrent.atomic.AtomicReference;

import org.tracegas.quantify.CancellationFlag;
import org.tracegas.store.LeaseLostException;
import org.tracegas.store.ProcessedSpectrum;
import org.tracegas.store.Session;
import org.tracegas.store.WorkUnitLease;
import org.tracegas.store.WorkUnitService;
import org.tracegas.store.WorkspaceStore;

/**
 * One runner's share of a batch of work units (see {@link WorkUnitService}): claims the next unit, processes
 * its payload into a block of spectra, and completes the unit together with that block, until every unit of
 * the batch is done. Any number of workers, in one process or in many on the same PostgreSQL database, can
 * run the same batch; each unit is stored exactly once.
 * <p>
 * While a unit is processed, a background thread renews its lease every third of the lease. If a renewal
 * finds the lease lost (the worker stalled longer than the lease and another runner took the unit), the
 * processor is told to stop through its cancellation flag and the unit's work is dropped. When all remaining
 * units are held by other runners, the worker waits {@code idlePoll} and asks again, so that it picks up a
 * unit whose runner died once its lease expires; it returns when the whole batch is finished (every unit done
 * or failed).
 * <p>
 * Stopping: setting the run's cancellation flag stops the processor of the current unit, gives that unit
 * back unprocessed (so another runner may take it at once) and ends the run. A processor exception marks the
 * unit failed with the exception's message, so that no runner tries it again (a corrupt file would fail every
 * time), and the worker goes on with the next unit. Not for concurrent use: run one worker per thread.
 * <p>
 * A runner processing container files, one file per unit:
 * <pre>{@code
 * StackProcessor stack = new StackProcessor(store, actor, projectId, chain, quantifier, versions);
 * WorkUnitWorker worker = new WorkUnitWorker(store, actor, batchId, host + ":" + pid, Duration.ofMinutes(2),
 *         Duration.ofSeconds(5), (payload, stop) -> stack.process(List.of(Path.of(payload)), stop));
 * WorkerOutcome outcome = worker.run((unit, spectra, progress) -> report(progress), cancel);
 * }</pre>
 * The batch itself is created once, by whoever starts the work, with {@link WorkUnitService#createBatch},
 * one payload per file.
 */
public final class WorkUnitWorker {

    private static final long CANCEL_POLL_MILLIS = 50;

    private final WorkspaceStore store;
    private final Session actor;
    private final String batchId;
    private final String runnerId;
    private final Duration lease;
    private final Duration idlePoll;
    private final UnitProcessor processor;

    /**
     * @param actor     the signed-in user the runner works for; needs write access to the batch's project
     * @param runnerId  names this runner in the work units and audit trail (e.g. host and process id)
     * @param lease     how long a claim lasts without renewal; longer than the longest database pause
     * @param idlePoll  how long to wait before asking again when all remaining units are held by others
     * @param processor turns a unit's payload into its block
     * @throws IllegalArgumentException naming the argument that is null or not positive
     */
    public WorkUnitWorker(WorkspaceStore store, Session actor, String batchId, String runnerId, Duration lease,
            Duration idlePoll, UnitProcessor processor) {
        if (store == null || actor == null || batchId == null || runnerId == null || processor == null) {
            throw new IllegalArgumentException("store, actor, batchId, runnerId and processor must not be null");
        }
        if (lease == null || lease.toMillis() < 3) {
            throw new IllegalArgumentException("lease must be at least 3 ms, was " + lease);
        }
        if (idlePoll == null || idlePoll.isNegative() || idlePoll.isZero()) {
            throw new IllegalArgumentException("idlePoll must be a positive duration, was " + idlePoll);
        }
        this.store = store;
        this.actor = actor;
        this.batchId = batchId;
        this.runnerId = runnerId;
        this.lease = lease;
        this.idlePoll = idlePoll;
        this.processor = processor;
    }

    /**
     * Works on the batch until it is finished or the flag is set.
     *
     * @param listener told after each unit this worker completed
     * @param cancel   stops the run; the unit in hand is given back unprocessed
     * @throws org.tracegas.store.StoreException on database errors
     */
    public WorkerOutcome run(UnitListener listener, CancellationFlag cancel) throws InterruptedException {
        ScheduledExecutorService timer = Executors.newSingleThreadScheduledExecutor(r -> {
            Thread t = new Thread(r, "work unit lease of " + runnerId);
            t.setDaemon(true);
            return t;
        });
        int completed = 0;
        int lost = 0;
        int failed = 0;
        try {
            WorkUnitService units = store.workUnits();
            while (!cancel.isCancelled()) {
                Optional<WorkUnitLease> claimed = units.claim(actor, batchId, runnerId, lease);
                if (claimed.isEmpty()) {
                    if (units.progress(actor, batchId).finished()) {
                        return new WorkerOutcome(completed, lost, failed, false);
                    }
                    sleep(idlePoll.toMillis(), cancel);
                    continue;
                }
                Processed result = work(claimed.get(), timer, cancel);
                if (result.lost()) {
                    lost++;
                } else if (result.failure() != null) {
                    if (markFailed(claimed.get(), result.failure())) {
                        failed++;
                    } else {
                        lost++;
                    }
                } else if (!cancel.isCancelled()) {
                    try {
                        units.complete(actor, claimed.get(), result.block());
                        completed++;
                        listener.unitDone(claimed.get(), result.block().size(), units.progress(actor, batchId));
                    } catch (LeaseLostException e) {
                        lost++;
                    }
                } else {
                    giveBack(claimed.get());
                }
            }
            return new WorkerOutcome(completed, lost, failed, true);
        } finally {
            timer.shutdownNow();
        }
    }

    /** What processing one unit came to: its block, the processor's error, or a lost lease. */
    private record Processed(List<ProcessedSpectrum> block, String failure, boolean lost) {
    }

    /**
     * Processes one unit while its lease is renewed. A processor exception after the run was cancelled is taken
     * for the processor stopping, and the unit counts as unprocessed rather than failed.
     */
    private Processed work(WorkUnitLease unit, ScheduledExecutorService timer, CancellationFlag cancel)
            throws InterruptedException {
        CancellationFlag stopUnit = new CancellationFlag();
        AtomicReference<WorkUnitLease> current = new AtomicReference<>(unit);
        AtomicBoolean leaseLost = new AtomicBoolean();
        long renewEvery = lease.toMillis() / 3;
        ScheduledFuture<?> renewal = timer.scheduleWithFixedDelay(() -> {
            try {
                current.set(store.workUnits().renew(actor, current.get(), lease));
            } catch (LeaseLostException e) {
                leaseLost.set(true);
                stopUnit.cancel();
            } catch (RuntimeException e) {
                // a failed renewal is tried again; the lease covers a few misses
            }
        }, renewEvery, renewEvery, TimeUnit.MILLISECONDS);
        ScheduledFuture<?> stopping = timer.scheduleWithFixedDelay(() -> {
            if (cancel.isCancelled()) {
                stopUnit.cancel();
            }
        }, 0, CANCEL_POLL_MILLIS, TimeUnit.MILLISECONDS);
        List<ProcessedSpectrum> block = null;
        String failure = null;
        try {
            block = processor.process(unit.payload(), stopUnit);
        } catch (InterruptedException e) {
            stop(timer, renewal, stopping);
            if (!leaseLost.get()) {
                giveBack(unit);
            }
            throw e;
        } catch (Exception e) {
            failure = e.getMessage() == null || e.getMessage().isBlank() ? e.toString() : e.getMessage();
        }
        stop(timer, renewal, stopping);
        if (leaseLost.get()) {
            return new Processed(null, null, true);
        }
        return new Processed(block, cancel.isCancelled() ? null : failure, false);
    }

    /** @return false when the unit was no longer this runner's to mark */
    private boolean markFailed(WorkUnitLease unit, String failure) {
        try {
            store.workUnits().fail(actor, unit, failure);
            return true;
        } catch (LeaseLostException e) {
            return false;
        }
    }

    /** Stops the unit's timer tasks and waits for a renewal that is running, so none overlaps what follows. */
    private static void stop(ScheduledExecutorService timer, ScheduledFuture<?>... tasks)
            throws InterruptedException {
        for (ScheduledFuture<?> t : tasks) {
            t.cancel(false);
        }
        try {
            timer.submit(() -> { }).get();
        } catch (ExecutionException e) {
            throw new IllegalStateException(e.getCause());
        }
    }

    private void giveBack(WorkUnitLease unit) {
        try {
            store.workUnits().release(actor, unit);
        } catch (LeaseLostException e) {
            // another runner has it already
        }
    }

    private static void sleep(long millis, CancellationFlag cancel) throws InterruptedException {
        long end = System.currentTimeMillis() + millis;
        for (long left = millis; left > 0 && !cancel.isCancelled(); left = end - System.currentTimeMillis()) {
            Thread.sleep(Math.min(left, CANCEL_POLL_MILLIS));
        }
    }
}
