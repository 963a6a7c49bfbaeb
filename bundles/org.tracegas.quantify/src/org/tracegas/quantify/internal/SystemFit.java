package org.tracegas.quantify.internal;

import java.util.function.IntFunction;

/**
 * Outcome of one {@link SystemSolver} for one sample; arrays are indexed like the system's compounds and rows and are
 * not to be written.
 *
 * @param amounts       fitted ppm·m per compound
 * @param amountSd      standard deviation of each amount from the fit covariance, in ppm·m
 * @param residual      sample minus model per fit point
 * @param contributions fitted absorbance of each compound per fit point, computed when asked for
 * @param iterations    iterations of the non-linear part (0 for a purely linear fit)
 * @param converged     whether the non-linear iteration met its tolerance
 * @param shift         fitted wavenumber shift in cm-1, NaN if not fitted
 * @param width         fitted width change in cm-2, NaN if not fitted
 * @param scale         fitted relative wavenumber scale of the sample against the references, NaN if not fitted
 * @param masked        number of fit points left out because the sample is not finite there (residual NaN)
 */
public record SystemFit(double[] amounts, double[] amountSd, double[] residual, IntFunction<double[]> contributions,
        int iterations, boolean converged, double shift, double width, double scale, int masked) {

    /** Fitted absorbance of compound c per fit point. */
    public double[] contribution(int c) {
        return contributions.apply(c);
    }

    /** Contributions of a linear fit: each compound's absorptivity column (may be shared) times its amount. */
    static IntFunction<double[]> linear(double[][] columns, double[] amounts) {
        return c -> {
            double[] out = new double[columns[c].length];
            for (int j = 0; j < out.length; j++) {
                out[j] = columns[c][j] * amounts[c];
            }
            return out;
        };
    }
}
