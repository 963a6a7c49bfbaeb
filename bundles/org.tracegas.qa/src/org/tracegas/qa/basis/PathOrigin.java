package org.tracegas.qa.basis;

/** Where the sample cell's absorption path used for a result came from. */
public enum PathOrigin {
    /** The nominal path the method states for the cell. */
    NOMINAL,
    /** The effective path derived from a calibration transfer standard measurement. */
    CTS_DERIVED
}
