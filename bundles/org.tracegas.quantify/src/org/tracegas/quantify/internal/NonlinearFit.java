package org.tracegas.quantify.internal;

/**
 * Result of a non-linear least-squares fit.
 *
 * @param parameters         best parameters
 * @param standardDeviations sqrt(s^2 (J^T W J)^-1_jj), with s^2 = weighted RSS / (points - parameters)
 * @param residual           target minus model at the best parameters, unweighted
 * @param weightedRss        weighted residual sum of squares
 * @param iterations         iterations of the optimizer
 */
public record NonlinearFit(double[] parameters, double[] standardDeviations, double[] residual, double weightedRss,
        int iterations) {
}
