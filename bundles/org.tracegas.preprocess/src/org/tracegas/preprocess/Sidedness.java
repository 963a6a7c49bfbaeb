package org.tracegas.preprocess;

/** Whether the interferogram was recorded on one side of the zero path difference or on both. */
public enum Sidedness {
    /**
     * A short part before ZPD and a long one after it (or the reverse): the short double-sided part is weighted
     * with a ramp so that each path difference counts once, and the long side sets the resolution.
     */
    SINGLE_SIDED,
    /** Both sides: the symmetric part around ZPD is transformed, the shorter side sets the resolution. */
    DOUBLE_SIDED
}
