package org.tracegas.pipeline.shared;

import org.tracegas.store.BatchProgress;
import org.tracegas.store.WorkUnitLease;

/** Told on the worker's thread after each unit this worker completed. */
@FunctionalInterface
public interface UnitListener {

    /** A listener that ignores progress. */
    UnitListener NONE = (unit, spectra, progress) -> { };

    /**
     * @param unit     the unit completed
     * @param spectra  processed spectra stored with it
     * @param progress the batch's progress right after the completion (all runners)
     */
    void unitDone(WorkUnitLease unit, int spectra, BatchProgress progress);
}
