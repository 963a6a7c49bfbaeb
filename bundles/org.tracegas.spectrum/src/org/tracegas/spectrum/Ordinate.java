package org.tracegas.spectrum;

/** What the values of a spectrum mean. */
public enum Ordinate {
    /** Decadic absorbance, -log10(T). */
    ABSORBANCE,
    /** Transmittance as a fraction (0..1). */
    TRANSMITTANCE,
    /** Single-beam intensity, arbitrary units. */
    SINGLE_BEAM,
    /** Detector signal of an interferogram. */
    INTERFEROGRAM,
    /** Anything else, for example a residual or a line shape. */
    ARBITRARY
}
