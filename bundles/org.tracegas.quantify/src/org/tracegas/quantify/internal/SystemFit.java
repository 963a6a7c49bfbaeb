package org.tracegas.quantify.internal;

/**
 * Outcome of one {@link FitSystem} for one sample; arrays are indexed like the system's compounds and rows and are
 * not to be written.
 *
 * @param amounts    fitted ppm·m per compound
 * @param amountSd   standard deviation of each amount from the fit covariance, in ppm·m
 * @param residual   sample minus model per fit point
 * @param columns    absorptivity column of each compound as used in the final fit (may be shared)
 * @param iterations iterations of the non-linear part (0 for a purely linear fit)
 * @param converged  whether the non-linear iteration met its tolerance
 * @param shift      fitted wavenumber shift in cm-1, NaN if not fitted
 * @param width      fitted width change in cm-2, NaN if not fitted
 */
public record SystemFit(double[] amounts, double[] amountSd, double[] residual, double[][] columns,
        int iterations, boolean converged, double shift, double width) {

    /** Fitted absorbance of compound c per fit point. */
    public double[] contribution(int c) {
        double[] out = new double[columns[c].length];
        for (int j = 0; j < out.length; j++) {
            out[j] = columns[c][j] * amounts[c];
        }
        return out;
    }
}
