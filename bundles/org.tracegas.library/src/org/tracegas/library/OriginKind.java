package org.tracegas.library;

/** How a reference spectrum came about. */
public enum OriginKind {
    /** Measured on a gas cell of known content. */
    MEASURED,
    /** Computed, for example line by line from a line list. */
    SYNTHETIC,
    /** Taken over from another collection of spectra. */
    IMPORTED
}
