package org.tracegas.store;

/**
 * How far a batch is. A unit whose lease has expired counts as claimed until someone claims it again.
 * <p>
 * A value of one moment, not a feature of the model's {@code WorkBatch}: the counts change with every claim and
 * completion by any runner, so an object holding them would be stale as soon as it was read, and runners read
 * them in their polling loop, where a small immutable value is all they need. The store counts them from the
 * units' rows each time it is asked.
 *
 * @param open    units no runner has claimed (or that were released)
 * @param claimed units held by a runner
 * @param done    units completed with their results
 * @param failed  units whose payload could not be processed; they are not claimed again
 */
public record BatchProgress(int open, int claimed, int done, int failed) {

    public int total() {
        return open + claimed + done + failed;
    }

    /** Whether no unit is left to work: every unit is done or failed. */
    public boolean finished() {
        return open == 0 && claimed == 0;
    }

    /** Whether every unit is done with its results. */
    public boolean complete() {
        return finished() && failed == 0;
    }
}
