package org.tracegas.quantify;

/** How a method turns the sample absorbance into amounts; every algorithm reports the same kind of result. */
public enum FitAlgorithm {
    /**
     * Classical least squares: absorbance proportional to the amount, pooled over the references, optionally with
     * the absorptivity interpolated between references at the current estimate ({@link
     * QuantificationMethod#nonlinearity()}) and line position terms ({@link ShiftTerm#SHIFT}, {@link
     * ShiftTerm#SHIFT_AND_WIDTH}).
     */
    CLASSICAL_LEAST_SQUARES,
    /**
     * A smooth, monotone curve of growth at every spectral point, absorbance against amount through the origin and
     * fixed by the references; all compounds and baselines fitted together by Gauss-Newton with Levenberg-Marquardt
     * damping. For saturated lines measured at several amounts. Line position term: {@link ShiftTerm#SCALE}.
     */
    CURVE_OF_GROWTH
}
