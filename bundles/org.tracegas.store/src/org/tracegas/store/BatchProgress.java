package org.tracegas.store;

/**
 * How far a batch is. A unit whose lease has expired counts as claimed until someone claims it again.
 *
 * @param open    units no runner has claimed (or that were released)
 * @param claimed units held by a runner
 * @param done    units completed with their results
 */
public record BatchProgress(int open, int claimed, int done) {

    public int total() {
        return open + claimed + done;
    }

    /** Whether every unit is done. */
    public boolean finished() {
        return open == 0 && claimed == 0;
    }
}
