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
    SHIFT_AND_WIDTH,
    /**
     * A relative wavenumber scale of the sample against the references, the sample's lines at nu (1 + scale):
     * what a slightly mis-set reference laser wavenumber does to every line at once. Offered by
     * {@link FitAlgorithm#CURVE_OF_GROWTH}, bounded to |scale| &lt;= {@link #MAX_SCALE}.
     */
    SCALE;

    /**
     * Largest relative wavenumber scale the fit accepts: 5e-5, 0.1 cm-1 at 2000 cm-1, a fifth of the 0.5 cm-1
     * point spacing, within which the first-order expansion A(nu (1 - s)) = A(nu) - s nu dA/dnu leaves about 4 %
     * of a line's peak at 0.5 cm-1 half width (second-order term (s nu)^2 / 2 d2A/dnu2). A fit that ends at the
     * bound is marked not converged.
     */
    public static final double MAX_SCALE = 5e-5;
}
