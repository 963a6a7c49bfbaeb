package org.tracegas.quantify;

/** Which non-linear terms the fit adds for a mismatch between sample and reference line positions. */
public enum ShiftTerm {
    /** Classical least squares only. */
    NONE,
    /** A common wavenumber shift of all references, fitted by Levenberg-Marquardt. */
    SHIFT,
    /**
     * A common shift and a common line-width change (the variance, in cm-2, of a Gaussian broadening; negative
     * narrows), the latter through a second-derivative expansion that holds for small width changes.
     */
    SHIFT_AND_WIDTH
}
