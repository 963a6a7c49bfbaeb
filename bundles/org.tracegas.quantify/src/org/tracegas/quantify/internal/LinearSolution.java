package org.tracegas.quantify.internal;

/**
 * Solution of a linear least-squares problem for one right-hand side.
 */
public final class LinearSolution {

    private final double[] coefficients;
    private final double[] residual;
    private final double weightedRss;
    private final int degreesOfFreedom;
    private final double[][] unscaledCovariance; // shared with the design, never written

    LinearSolution(double[] coefficients, double[] residual, double weightedRss, int degreesOfFreedom,
            double[][] unscaledCovariance) {
        this.coefficients = coefficients;
        this.residual = residual;
        this.weightedRss = weightedRss;
        this.degreesOfFreedom = degreesOfFreedom;
        this.unscaledCovariance = unscaledCovariance;
    }

    public double coefficient(int j) {
        return coefficients[j];
    }

    public double[] coefficients() {
        return coefficients.clone();
    }

    /** y - X c, unweighted, per point. */
    public double[] residual() {
        return residual.clone();
    }

    /** The residual array itself, for a caller that takes it over; no copy. */
    double[] residualUnsafe() {
        return residual;
    }

    /** Weighted residual sum of squares. */
    public double weightedRss() {
        return weightedRss;
    }

    public int degreesOfFreedom() {
        return degreesOfFreedom;
    }

    /** Residual variance estimate: weighted RSS / (points - coefficients). */
    public double residualVariance() {
        return weightedRss / degreesOfFreedom;
    }

    /** Standard deviation of coefficient j: sqrt(s^2 (X^T W X)^-1_jj). */
    public double standardDeviation(int j) {
        return Math.sqrt(residualVariance() * unscaledCovariance[j][j]);
    }
}
