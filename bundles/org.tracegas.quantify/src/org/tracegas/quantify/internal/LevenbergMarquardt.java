package org.tracegas.quantify.internal;

import org.apache.commons.math3.fitting.leastsquares.LeastSquaresBuilder;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresOptimizer.Optimum;
import org.apache.commons.math3.fitting.leastsquares.LevenbergMarquardtOptimizer;
import org.apache.commons.math3.fitting.leastsquares.MultivariateJacobianFunction;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.DiagonalMatrix;
import org.apache.commons.math3.linear.RealVector;
import org.apache.commons.math3.util.Pair;

/**
 * Non-linear least squares through the Commons Math Levenberg-Marquardt optimizer. The parameter covariance is
 * taken from a {@link LinearDesign} of the final Jacobian (scaled SVD), not from an inverted J^T J.
 */
public final class LevenbergMarquardt {

    private final int maxIterations;
    private final double relativeTolerance;

    /**
     * @param maxIterations     cap on optimizer iterations
     * @param relativeTolerance relative tolerance on cost and parameters
     */
    public LevenbergMarquardt(int maxIterations, double relativeTolerance) {
        if (maxIterations < 1) {
            throw new IllegalArgumentException("maxIterations must be at least 1, was " + maxIterations);
        }
        if (!(relativeTolerance > 0)) {
            throw new IllegalArgumentException("relativeTolerance must be positive, was " + relativeTolerance);
        }
        this.maxIterations = maxIterations;
        this.relativeTolerance = relativeTolerance;
    }

    /**
     * @param model   the model
     * @param target  observed values
     * @param weights weight per point, or null for equal weights
     * @param start   start parameters
     * @throws org.apache.commons.math3.exception.TooManyIterationsException if it does not converge in time
     */
    public NonlinearFit fit(ModelFunction model, double[] target, double[] weights, double[] start) {
        int n = target.length;
        int p = start.length;
        MultivariateJacobianFunction f = point -> {
            double[] values = new double[n];
            double[][] jacobian = new double[n][p];
            model.evaluate(point.toArray(), values, jacobian);
            return new Pair<RealVector, org.apache.commons.math3.linear.RealMatrix>(new ArrayRealVector(values, false),
                    new Array2DRowRealMatrix(jacobian, false));
        };
        LeastSquaresBuilder builder = new LeastSquaresBuilder().model(f).target(target).start(start)
                .maxIterations(maxIterations).maxEvaluations(Integer.MAX_VALUE);
        if (weights != null) {
            builder.weight(new DiagonalMatrix(weights));
        }
        LevenbergMarquardtOptimizer optimizer = new LevenbergMarquardtOptimizer()
                .withCostRelativeTolerance(relativeTolerance).withParameterRelativeTolerance(relativeTolerance);
        Optimum optimum = optimizer.optimize(builder.build());
        double[] best = optimum.getPoint().toArray();
        double[] values = new double[n];
        double[][] jacobian = new double[n][p];
        model.evaluate(best, values, jacobian);
        double[] residual = new double[n];
        double rss = 0;
        for (int i = 0; i < n; i++) {
            residual[i] = target[i] - values[i];
            rss += (weights == null ? 1.0 : weights[i]) * residual[i] * residual[i];
        }
        double[][] columns = new double[p][n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < p; j++) {
                columns[j][i] = jacobian[i][j];
            }
        }
        double[][] cov = LinearDesign.of(columns, weights, "Jacobian at the optimum").unscaledCovariance();
        double s2 = rss / (n - p);
        double[] sd = new double[p];
        for (int j = 0; j < p; j++) {
            sd[j] = Math.sqrt(s2 * cov[j][j]);
        }
        return new NonlinearFit(best, sd, residual, rss, optimum.getIterations());
    }
}
