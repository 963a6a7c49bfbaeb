package org.tracegas.preprocess;

/** How the complex spectrum of an interferogram becomes a real single beam. */
public enum PhaseCorrection {
    /**
     * Mertz: the phase is taken at low resolution from a short double-sided part around the zero path difference
     * and removed from the full-resolution spectrum (keeps the noise statistics linear).
     */
    MERTZ,
    /** The magnitude of the complex spectrum (needs no phase; noise does not average to zero). */
    MAGNITUDE
}
