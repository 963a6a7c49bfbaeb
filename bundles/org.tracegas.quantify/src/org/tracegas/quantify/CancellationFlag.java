package org.tracegas.quantify;

/** Set from any thread to stop a batch; the batch checks it before each spectrum. */
public final class CancellationFlag {

    private volatile boolean cancelled;

    public void cancel() {
        cancelled = true;
    }

    public boolean isCancelled() {
        return cancelled;
    }
}
