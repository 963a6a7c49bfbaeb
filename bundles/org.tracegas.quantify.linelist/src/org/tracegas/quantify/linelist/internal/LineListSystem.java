package org.tracegas.quantify.linelist.internal;

import java.util.List;
import java.util.function.IntFunction;

import org.apache.commons.math3.fitting.leastsquares.LeastSquaresBuilder;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresOptimizer.Optimum;
import org.apache.commons.math3.fitting.leastsquares.LevenbergMarquardtOptimizer;
import org.apache.commons.math3.linear.DiagonalMatrix;
import org.tracegas.quantify.ShiftTerm;
import org.tracegas.quantify.internal.FitPoints;
import org.tracegas.quantify.internal.LinearDesign;
import org.tracegas.quantify.internal.SystemFit;
import org.tracegas.quantify.internal.SystemSolver;

/**
 * One line-list fit: the sample absorbance at the fit points against -log10 of the mixture's observed
 * transmittance ({@link MixtureModel}) read at nu / (1 + scale), plus each region's baseline polynomial. The
 * parameters (amounts, baseline coefficients, scale) are fitted together by the Levenberg-Marquardt optimizer of
 * Commons Math; the scale is held within +-{@link ShiftTerm#MAX_SCALE} and a fit that ends at that bound, or does
 * not settle within the iteration cap, is reported as not converged. The amounts' standard deviations are
 * sqrt(s^2 (J^T W J)^-1) of the final Jacobian, s^2 the weighted residual sum of squares over the degrees of freedom.
 * <p>
 * Weights: the method's weight of each point times the inverse of its noise variance, which for a spectrometer's
 * noise (even in transmittance) grows in absorbance as 1 / T^2 with the measured transmittance T: the saturated line
 * cores, where the absorbance is noisiest, count less, and s^2 estimates one variance shared by all weighted
 * residuals. Fitted with equal weights, the accuracy test's saturating gas had 83.5 % of its results within 2u
 * instead of about 95 %, because one pooled s^2 understated the noise where its amount is decided. The correlation
 * of neighbouring points by apodization and zero filling is left to the sample's noise-correlation factor, which
 * enlarges the stated uncertainties as for every fit algorithm; for lines about as narrow as the correlation it
 * errs on the safe side (accuracy test, Norton-Beer medium apodization: 97.5 % and 98.2 % within 2u).
 */
public final class LineListSystem implements SystemSolver {

    /** Floor of the measured transmittance in the noise weights: a point darker than 1e-3 weighs next to nothing. */
    private static final double LEAST_MEASURED_TRANSMITTANCE = 1e-3;

    private final String label;
    private final List<String> compounds;
    private final MixtureModel mixture;
    private final CubicReader reader;
    private final FitPoints points;
    private final double[] nu;          // wavenumber per fit point
    private final double[] weights;     // per fit point, or null
    private final double[][] baseline;  // [term][fit point]
    private final boolean scale;
    private final double tolerance;
    private final int maxIterations;

    /**
     * @param label       names the fit in messages
     * @param compounds   compound names in the mixture model's order
     * @param mixture     the mixture's model
     * @param points      the fit points with their baselines and weights
     * @param wavenumbers the sample axis
     * @param scale       whether a relative wavenumber scale is fitted
     * @param tolerance   relative change of the cost and the parameters at which the iteration stops
     * @param maxIterations cap on iterations
     */
    public LineListSystem(String label, List<String> compounds, MixtureModel mixture, FitPoints points,
            double[] wavenumbers, boolean scale, double tolerance, int maxIterations) {
        this.label = label;
        this.compounds = List.copyOf(compounds);
        this.mixture = mixture;
        this.reader = new CubicReader(mixture.grid());
        this.points = points;
        this.nu = points.gather(wavenumbers);
        this.weights = points.weightsUnsafe();
        this.baseline = points.baselineUnsafe();
        this.scale = scale;
        this.tolerance = tolerance;
        this.maxIterations = maxIterations;
    }

    @Override
    public String label() {
        return label;
    }

    @Override
    public FitPoints points() {
        return points;
    }

    @Override
    public int compounds() {
        return compounds.size();
    }

    @Override
    public String compound(int column) {
        return compounds.get(column);
    }

    /** No reference bounds the amounts: a line list holds at any amount. */
    @Override
    public double highestAmount(int column) {
        return Double.POSITIVE_INFINITY;
    }

    @Override
    public SystemFit fit(double[] sample) {
        int n = points.size();
        int[] active = new int[n];
        int used = 0;
        for (int j = 0; j < n; j++) {
            if (Double.isFinite(sample[points.row(j)])) {
                active[used++] = j;
            }
        }
        int nc = compounds.size();
        int nb = baseline.length;
        int p = nc + nb + (scale ? 1 : 0);
        if (used <= p) {
            throw new IllegalArgumentException(label + ": only " + used + " of " + n
                    + " fit points are finite in the sample, too few for " + p + " parameters");
        }
        double[] target = new double[used];
        double[] w = new double[used];
        for (int k = 0; k < used; k++) {
            target[k] = sample[points.row(active[k])];
            w[k] = (weights == null ? 1 : weights[active[k]]) * noiseWeight(target[k]);
        }
        int[] rows = java.util.Arrays.copyOf(active, used);
        FitPointModel model = new FitPointModel(mixture, nu, baseline, rows, scale);
        boolean[] capped = new boolean[1];
        // lazily: the Jacobian's convolutions only at accepted steps (FitPointModel)
        LeastSquaresBuilder builder = new LeastSquaresBuilder().model(model).lazyEvaluation(true).target(target)
                .start(new double[p]).maxIterations(Integer.MAX_VALUE).maxEvaluations(Integer.MAX_VALUE)
                .checker((iteration, previous, current) -> {
                    if (iteration >= maxIterations) {
                        capped[0] = true;
                        return true;
                    }
                    double before = previous.getCost();
                    return Math.abs(before - current.getCost()) <= tolerance * Math.max(before, Double.MIN_NORMAL);
                })
                .parameterValidator(point -> {
                    if (scale) {
                        double s = point.getEntry(p - 1);
                        point.setEntry(p - 1, Math.max(-ShiftTerm.MAX_SCALE, Math.min(ShiftTerm.MAX_SCALE, s)));
                    }
                    return point;
                });
        builder.weight(new DiagonalMatrix(w));
        Optimum optimum = new LevenbergMarquardtOptimizer().withCostRelativeTolerance(tolerance)
                .withParameterRelativeTolerance(tolerance).optimize(builder.build());
        double[] best = optimum.getPoint().toArray();
        double[] values = model.computeValue(best).toArray();
        double[][] jacobian = model.computeJacobian(best).getData();
        double[] residual = new double[n];
        java.util.Arrays.fill(residual, Double.NaN);
        double rss = 0;
        for (int k = 0; k < used; k++) {
            double r = target[k] - values[k];
            residual[rows[k]] = r;
            rss += w[k] * r * r;
        }
        double[][] columns = new double[p][used];
        for (int k = 0; k < used; k++) {
            for (int q = 0; q < p; q++) {
                columns[q][k] = jacobian[k][q];
            }
        }
        double[][] cov = LinearDesign.of(columns, w, label + ": Jacobian at the optimum").unscaledCovariance();
        double s2 = rss / (used - p);
        double[] amounts = java.util.Arrays.copyOf(best, nc);
        double[] sd = new double[nc];
        for (int c = 0; c < nc; c++) {
            sd[c] = Math.sqrt(s2 * cov[c][c]);
        }
        double fitted = scale ? best[p - 1] : Double.NaN;
        boolean atBound = scale && Math.abs(fitted) >= ShiftTerm.MAX_SCALE * (1 - 1e-9);
        return new SystemFit(amounts, sd, residual, contributions(amounts, scale ? fitted : 0), optimum.getIterations(),
                !capped[0] && !atBound, Double.NaN, Double.NaN, fitted, n - used);
    }

    /**
     * The inverse variance of a sample absorbance A relative to that of a point with no absorption: a
     * spectrometer's noise is even in transmittance, and A = -log10 T carries a transmittance error dT as dT / (T ln
     * 10) (first-order error propagation), so var(A) grows as 1 / T^2. T is the measured 10^-A, floored where noise
     * took it to nothing.
     */
    private static double noiseWeight(double absorbance) {
        double t = Math.max(Math.pow(10, -absorbance), LEAST_MEASURED_TRANSMITTANCE);
        return t * t;
    }

    /** Absorbance each compound alone would show at its fitted amount, computed when a plot asks for it. */
    private IntFunction<double[]> contributions(double[] amounts, double s) {
        return c -> {
            double[] observed = mixture.observeAlone(c, amounts[c]);
            double[] out = new double[nu.length];
            double[] read = new double[2];
            for (int j = 0; j < out.length; j++) {
                reader.read(observed, nu[j] / (1 + s), read);
                out[j] = -Math.log10(Math.max(read[0], FitPointModel.LEAST_TRANSMITTANCE));
            }
            return out;
        };
    }
}
