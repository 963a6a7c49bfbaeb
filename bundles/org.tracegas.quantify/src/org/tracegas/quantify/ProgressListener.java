package org.tracegas.quantify;

/** Told after each delivered result of a batch. */
@FunctionalInterface
public interface ProgressListener {

    /** A listener that ignores progress. */
    ProgressListener NONE = (done, total) -> { };

    /**
     * @param done  results delivered so far
     * @param total number of samples, or -1 if not known
     */
    void progress(long done, long total);
}
