package org.tracegas.quantify.internal;

import java.util.Arrays;
import java.util.List;
import java.util.function.IntFunction;

import org.tracegas.quantify.ShiftTerm;

/**
 * The joint non-linear fit of one system on curves of growth: the sample absorbance at each fit point is modelled
 * as the sum over the compounds of their curves of growth ({@link CurveOfGrowth}) plus the regions' baseline
 * polynomials, and optionally a relative wavenumber scale of the sample; amounts, baselines and scale are fitted
 * together by Gauss-Newton steps with Levenberg-Marquardt damping and the analytic Jacobian.
 * <p>
 * Why it is fast: at every point the model is a sum of fixed vectors (the curve coefficients of each compound,
 * their wavenumber derivatives times the wavenumber for the scale, the baseline terms) times coefficients that
 * depend on the parameters only (the curve terms u, v, v^2 of each amount, the scale times each, the baseline
 * values). The Gram matrix G of those vectors is formed once per method and axis, the sample enters only through its projection b onto them (one pass over the
 * points), and each iteration works on the small vectors: the weighted residual sum of squares is
 * y'Wy - 2 beta'b + beta'G beta, its Gauss-Newton matrix J'WJ = D'GD and gradient D'(b - G beta) with D the
 * derivative of the coefficients beta by the parameters. No iteration touches the spectrum, and none decomposes
 * more than the k x k normal equations (k = compounds + baseline terms + scale). Work arrays are kept per thread.
 * <p>
 * Points where the sample is not finite are masked: left out of the projection, and their outer products taken
 * off a copy of G. The standard deviation of each amount is sqrt(s_c^2 (J'WJ)^-1_cc) at the optimum, with s_c^2
 * the weighted residual variance where that amount's information lies: the squared residual averaged with the
 * squared Jacobian column of the amount at mid-range (half the highest reference, fixed per method so that it costs
 * one pass) as weights, times points / (points - parameters). Why not one s^2 for all:
 * a spectrometer's noise is even in transmittance, so in absorbance it grows as 1/T (error propagation of -log10)
 * and is largest at the saturated points that carry a saturating compound's amount; one pooled s^2 understates
 * that compound's uncertainty (with the accuracy test's generator, 89 % instead of 93 % of its results within
 * 2u). For noise even in absorbance s_c^2 and s^2 agree.
 */
public final class CurveOfGrowthSystem implements SystemSolver {

    private static final double INITIAL_DAMPING = 1e-3;
    private static final double GIVE_UP_DAMPING = 1e12;
    /** Scaled amount at which a compound's Jacobian column weighs the residual for its variance: mid-range. */
    private static final double INFORMATION_AMOUNT = 0.5;

    private final String label;
    private final List<CurveOfGrowth> curves;
    private final FitPoints points;
    private final double[] weights;   // per point, or null
    private final int nc;             // compounds
    private final int nb;             // baseline terms
    private final boolean scale;
    private final int vectors;        // K: 3 nc (+ 3 nc for the scale) + nb
    private final int parameters;     // nc + nb (+ 1)
    private final double[][] basis;   // [K][point]
    private final PointMajorVectors projection; // basis times weights, point by point: the sample's projection
    private final double[][] gram;    // [K][K]
    private final int[] entryStart;   // parameter -> first entry of D's column
    private final int[] entryIndex;   // entry -> basis vector
    private final double[] lowest;    // lowest reference / highest, per compound: the scale of a step in u
    private final PointMajorVectors information; // [point][compound]: weight of the point in the compound's variance
    private final double[] informationSum;
    private final double tolerance;
    private final int maxIterations;
    private final ThreadLocal<Work> work;

    /**
     * @param label         names the system in messages, for example "fit of CO"
     * @param curves        the compounds' curves of growth, in column order
     * @param points        the fit points, regions and baselines
     * @param wavenumbers   the sample axis
     * @param shiftTerm     NONE or SCALE
     * @param tolerance     relative change of every amount below which the iteration has converged
     * @param maxIterations iteration cap
     * @throws IllegalArgumentException if a reference does not cover a fit point, the system has no more points
     *                                  than parameters, or the shift term is not offered
     */
    public CurveOfGrowthSystem(String label, List<CurveOfGrowth> curves, FitPoints points, double[] wavenumbers,
            ShiftTerm shiftTerm, double tolerance, int maxIterations) {
        if (shiftTerm != ShiftTerm.NONE && shiftTerm != ShiftTerm.SCALE) {
            throw new IllegalArgumentException(label + ": the curve-of-growth fit offers no " + shiftTerm
                    + " term, only SCALE");
        }
        this.label = label;
        this.curves = List.copyOf(curves);
        this.points = points;
        this.weights = points.weightsUnsafe();
        this.nc = curves.size();
        this.nb = points.baselineTerms();
        this.scale = shiftTerm == ShiftTerm.SCALE;
        this.tolerance = tolerance;
        this.maxIterations = maxIterations;
        int n = points.size();
        int terms = CurveOfGrowth.TERMS;
        this.vectors = terms * nc * (scale ? 2 : 1) + nb;
        this.parameters = nc + nb + (scale ? 1 : 0);
        if (n <= parameters) {
            throw new IllegalArgumentException(label + " has " + n + " points for " + parameters
                    + " parameters; it needs more points than parameters");
        }
        double[] nu = points.gather(wavenumbers);
        this.basis = new double[vectors][];
        this.lowest = new double[nc];
        for (int c = 0; c < nc; c++) {
            CurveOfGrowth curve = curves.get(c);
            lowest[c] = curve.lowestAmount() / curve.highestAmount();
            double[][][] onPoints = curve.onPoints(label, nu, scale);
            for (int p = 0; p < terms; p++) {
                basis[termVector(c, p)] = onPoints[0][p];
                if (scale) {
                    // the sample's lines at nu (1 + s): A(nu / (1 + s)) = A(nu) - s nu dA/dnu to first order
                    double[] moved = new double[n];
                    for (int j = 0; j < n; j++) {
                        moved[j] = -nu[j] * onPoints[1][p][j];
                    }
                    basis[scaleVector(c, p)] = moved;
                }
            }
        }
        double[][] informationOfCompound = new double[nc][n];
        this.informationSum = new double[nc];
        for (int c = 0; c < nc; c++) {
            CurveOfGrowth curve = curves.get(c);
            for (int j = 0; j < n; j++) {
                double slope = 0;
                for (int p = 0; p < terms; p++) {
                    slope += curve.shapeSlope(p, INFORMATION_AMOUNT) * basis[termVector(c, p)][j];
                }
                informationOfCompound[c][j] = slope * slope * (weights == null ? 1 : weights[j]);
                informationSum[c] += informationOfCompound[c][j];
            }
        }
        this.information = new PointMajorVectors(informationOfCompound, n);
        double[][] baseline = points.baselineUnsafe();
        for (int t = 0; t < nb; t++) {
            basis[baselineVector(t)] = baseline[t];
        }
        double[][] weighted = basis;
        if (weights != null) {
            weighted = new double[vectors][n];
            for (int k = 0; k < vectors; k++) {
                for (int j = 0; j < n; j++) {
                    weighted[k][j] = basis[k][j] * weights[j];
                }
            }
        }
        this.gram = new double[vectors][vectors];
        for (int k = 0; k < vectors; k++) {
            for (int l = 0; l <= k; l++) {
                gram[k][l] = dot(weighted[k], basis[l], n);
                gram[l][k] = gram[k][l];
            }
        }
        this.projection = new PointMajorVectors(weighted, n);
        // which basis vectors each parameter moves: the sparsity of D = d beta / d theta
        this.entryStart = new int[parameters + 1];
        int[] index = new int[nc * terms * (scale ? 3 : 1) + nb];
        int e = 0;
        for (int c = 0; c < nc; c++) {
            entryStart[c] = e;
            for (int p = 0; p < terms; p++) {
                index[e++] = termVector(c, p);
                if (scale) {
                    index[e++] = scaleVector(c, p);
                }
            }
        }
        for (int t = 0; t < nb; t++) {
            entryStart[nc + t] = e;
            index[e++] = baselineVector(t);
        }
        if (scale) {
            entryStart[nc + nb] = e;
            for (int c = 0; c < nc; c++) {
                for (int p = 0; p < terms; p++) {
                    index[e++] = scaleVector(c, p);
                }
            }
        }
        entryStart[parameters] = e;
        this.entryIndex = index;
        this.work = ThreadLocal.withInitial(Work::new);
    }

    private int termVector(int compound, int term) {
        return compound * CurveOfGrowth.TERMS + term;
    }

    private int scaleVector(int compound, int term) {
        return (nc + compound) * CurveOfGrowth.TERMS + term;
    }

    private int baselineVector(int term) {
        return CurveOfGrowth.TERMS * nc * (scale ? 2 : 1) + term;
    }

    private static double dot(double[] a, double[] b, int n) {
        double sum = 0;
        for (int j = 0; j < n; j++) {
            sum += a[j] * b[j];
        }
        return sum;
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
        return nc;
    }

    @Override
    public String compound(int column) {
        return curves.get(column).compound();
    }

    @Override
    public double highestAmount(int column) {
        return curves.get(column).highestAmount();
    }

    /** Work arrays of one thread, reused from spectrum to spectrum. */
    private final class Work {
        final double[] wy = new double[points.size()];
        final double[] b = new double[vectors];
        final double[] beta = new double[vectors];
        final double[] g = new double[vectors];            // G beta
        final double[] local = new double[nc];             // information-weighted residual sums of squares
        final double[][] maskedGram = new double[vectors][vectors];
        final double[] entryWeight = new double[entryIndex.length];
        final double[][] gd = new double[parameters][vectors]; // rows of G D
        final double[][] normal = new double[parameters][parameters];
        final double[][] factor = new double[parameters][parameters];
        final double[] gradient = new double[parameters];
        final double[] diagonal = new double[parameters];
        final double[] step = new double[parameters];
        final double[] theta = new double[parameters];
        final double[] trial = new double[parameters];
        final boolean[] held = new boolean[parameters];
    }

    @Override
    public SystemFit fit(double[] sample) {
        Work w = work.get();
        int n = points.size();
        int masked = 0;
        double yWy = 0;
        for (int j = 0; j < n; j++) {
            double y = sample[points.row(j)];
            if (Double.isFinite(y)) {
                w.wy[j] = y;
                yWy += y * y * (weights == null ? 1 : weights[j]);
            } else {
                w.wy[j] = 0;
                masked++;
            }
        }
        if (n - masked <= parameters) {
            throw new IllegalArgumentException(label + ": only " + (n - masked) + " of " + n
                    + " fit points are finite in the sample, too few for " + parameters + " parameters");
        }
        projection.dot(w.wy, w.b);
        double[][] g = gram;
        if (masked > 0) {
            g = maskedGram(w, sample);
        }
        Arrays.fill(w.theta, 0);
        boolean converged = false;
        int iterations = 0;
        double damping = INITIAL_DAMPING;
        coefficients(w.theta, w);
        double rss = rss(w, g, yWy);
        while (!converged && iterations < maxIterations) {
            iterations++;
            normalEquations(w, g);
            boolean accepted = false;
            while (!accepted && damping < GIVE_UP_DAMPING) {
                if (solve(w, damping)) {
                    for (int q = 0; q < parameters; q++) {
                        w.trial[q] = w.theta[q] + w.step[q];
                    }
                    if (scale) {
                        w.trial[parameters - 1] = Math.max(-ShiftTerm.MAX_SCALE,
                                Math.min(ShiftTerm.MAX_SCALE, w.trial[parameters - 1]));
                    }
                    coefficients(w.trial, w);
                    double trialRss = rss(w, g, yWy);
                    if (trialRss <= rss) {
                        accepted = true;
                        converged = small(w);
                        System.arraycopy(w.trial, 0, w.theta, 0, parameters);
                        rss = trialRss;
                        damping = Math.max(damping / 10, 1e-12);
                        break;
                    }
                }
                damping *= 10;
            }
            if (!accepted) {
                // no step lowers the sum of squares any more: the optimum within rounding
                converged = true;
            }
        }
        coefficients(w.theta, w);
        if (scale && Math.abs(w.theta[parameters - 1]) >= ShiftTerm.MAX_SCALE) {
            converged = false;
        }
        return result(w, g, sample, masked, iterations, converged);
    }

    /** G less the masked points' outer products, symmetric like G: {@link #rss} takes its rows for columns. */
    private double[][] maskedGram(Work w, double[] sample) {
        double[][] m = w.maskedGram;
        for (int k = 0; k < vectors; k++) {
            System.arraycopy(gram[k], 0, m[k], 0, vectors);
        }
        for (int j = 0; j < points.size(); j++) {
            if (!Double.isFinite(sample[points.row(j)])) {
                for (int k = 0; k < vectors; k++) {
                    double bk = projection.at(j, k);
                    if (bk != 0) {
                        for (int l = 0; l <= k; l++) {
                            m[k][l] -= bk * basis[l][j];
                        }
                    }
                }
            }
        }
        for (int k = 0; k < vectors; k++) {
            for (int l = 0; l < k; l++) {
                m[l][k] = m[k][l];
            }
        }
        return m;
    }

    /** beta(theta) and the entries of D = d beta / d theta, into the work arrays. */
    private void coefficients(double[] theta, Work w) {
        double s = scale ? theta[parameters - 1] : 0;
        int e = 0;
        for (int c = 0; c < nc; c++) {
            CurveOfGrowth curve = curves.get(c);
            double u = theta[c];
            for (int p = 0; p < CurveOfGrowth.TERMS; p++) {
                double f = curve.shape(p, u);
                double d = curve.shapeSlope(p, u);
                w.beta[termVector(c, p)] = f;
                w.entryWeight[e++] = d;
                if (scale) {
                    w.beta[scaleVector(c, p)] = s * f;
                    w.entryWeight[e++] = s * d;
                }
            }
        }
        for (int t = 0; t < nb; t++) {
            w.beta[baselineVector(t)] = theta[nc + t];
            w.entryWeight[e++] = 1;
        }
        if (scale) {
            for (int c = 0; c < nc; c++) {
                for (int p = 0; p < CurveOfGrowth.TERMS; p++) {
                    w.entryWeight[e++] = curves.get(c).shape(p, theta[c]);
                }
            }
        }
    }

    /**
     * y'Wy - 2 beta'b + beta'G beta, leaving G beta in the work arrays. G beta is summed column by column (row l of
     * the symmetric G is its column l), which the compiler does with vector instructions; every element still adds
     * its terms in the order of l.
     */
    private double rss(Work w, double[][] g, double yWy) {
        double[] gBeta = w.g;
        Arrays.fill(gBeta, 0);
        for (int l = 0; l < vectors; l++) {
            double[] column = g[l];
            double bl = w.beta[l];
            for (int k = 0; k < vectors; k++) {
                gBeta[k] += column[k] * bl;
            }
        }
        double cross = 0;
        double quadratic = 0;
        for (int k = 0; k < vectors; k++) {
            cross += w.beta[k] * w.b[k];
            quadratic += w.beta[k] * gBeta[k];
        }
        return Math.max(0, yWy - 2 * cross + quadratic);
    }

    /** J'WJ = D'GD and the gradient D'(b - G beta) at the current coefficients. */
    private void normalEquations(Work w, double[][] g) {
        for (int q = 0; q < parameters; q++) {
            double[] row = w.gd[q];
            Arrays.fill(row, 0);
            double grad = 0;
            for (int e = entryStart[q]; e < entryStart[q + 1]; e++) {
                double weight = w.entryWeight[e];
                int k = entryIndex[e];
                if (weight != 0) {
                    double[] gk = g[k];
                    for (int l = 0; l < vectors; l++) {
                        row[l] += weight * gk[l];
                    }
                    grad += weight * (w.b[k] - w.g[k]);
                }
            }
            w.gradient[q] = grad;
        }
        for (int q = 0; q < parameters; q++) {
            double[] row = w.gd[q];
            for (int r = 0; r <= q; r++) {
                double sum = 0;
                for (int e = entryStart[r]; e < entryStart[r + 1]; e++) {
                    sum += w.entryWeight[e] * row[entryIndex[e]];
                }
                w.normal[q][r] = sum;
                w.normal[r][q] = sum;
            }
        }
        double largest = 0;
        for (int q = 0; q < parameters; q++) {
            largest = Math.max(largest, w.normal[q][q]);
        }
        for (int q = 0; q < parameters; q++) {
            // a parameter that moves nothing yet (the scale while all amounts are zero) is held where it is
            w.held[q] = !(w.normal[q][q] > 1e-14 * largest);
            w.diagonal[q] = w.held[q] ? 1 : Math.sqrt(w.normal[q][q]);
        }
    }

    /**
     * Solves (N + damping diag N) step = gradient by a Cholesky factorisation of the diagonally scaled matrix, held
     * parameters fixed.
     *
     * @return false if the matrix is not positive definite at this damping
     */
    private boolean solve(Work w, double damping) {
        if (!factorise(w, damping)) {
            return false;
        }
        for (int q = 0; q < parameters; q++) {
            w.step[q] = w.held[q] ? 0 : w.gradient[q] / w.diagonal[q];
        }
        substitute(w, w.step);
        for (int q = 0; q < parameters; q++) {
            w.step[q] = w.held[q] ? 0 : w.step[q] / w.diagonal[q];
        }
        return true;
    }

    private boolean factorise(Work w, double damping) {
        double[][] l = w.factor;
        for (int q = 0; q < parameters; q++) {
            for (int r = 0; r <= q; r++) {
                double a;
                if (w.held[q] || w.held[r]) {
                    a = q == r ? 1 : 0;
                } else {
                    a = w.normal[q][r] / (w.diagonal[q] * w.diagonal[r]) + (q == r ? damping : 0);
                }
                for (int t = 0; t < r; t++) {
                    a -= l[q][t] * l[r][t];
                }
                if (q == r) {
                    if (!(a > 1e-15)) {
                        return false;
                    }
                    l[q][q] = Math.sqrt(a);
                } else {
                    l[q][r] = a / l[r][r];
                }
            }
        }
        return true;
    }

    /** Solves L L' x = v in place. */
    private void substitute(Work w, double[] v) {
        double[][] l = w.factor;
        for (int q = 0; q < parameters; q++) {
            double sum = v[q];
            for (int t = 0; t < q; t++) {
                sum -= l[q][t] * v[t];
            }
            v[q] = sum / l[q][q];
        }
        for (int q = parameters - 1; q >= 0; q--) {
            double sum = v[q];
            for (int t = q + 1; t < parameters; t++) {
                sum -= l[t][q] * v[t];
            }
            v[q] = sum / l[q][q];
        }
    }

    /** Element (c, c) of the inverse of the factorised matrix L L': the squared norm of L^-1 e_c. */
    private double inverseDiagonal(Work w, int c) {
        double[][] l = w.factor;
        double[] x = w.step;
        double norm = 0;
        // forward substitution of the unit vector c: the entries above c stay zero
        for (int q = c; q < parameters; q++) {
            double sum = q == c ? 1 : 0;
            for (int t = c; t < q; t++) {
                sum -= l[q][t] * x[t];
            }
            x[q] = sum / l[q][q];
            norm += x[q] * x[q];
        }
        return norm;
    }

    /** Whether the last step moved every amount by less than the tolerance, relative to the amount or lowest reference. */
    private boolean small(Work w) {
        for (int c = 0; c < nc; c++) {
            if (Math.abs(w.step[c]) > tolerance * Math.max(Math.abs(w.trial[c]), lowest[c])) {
                return false;
            }
        }
        return !scale || Math.abs(w.step[parameters - 1]) <= tolerance * ShiftTerm.MAX_SCALE;
    }

    private SystemFit result(Work w, double[][] g, double[] sample, int masked, int iterations,
            boolean converged) {
        int n = points.size();
        double[] residual = new double[n];
        for (int j = 0; j < n; j++) {
            residual[j] = sample[points.row(j)];
        }
        // four vectors per pass over the residual: a quarter of the memory traffic
        int k = 0;
        for (; k + 4 <= vectors; k += 4) {
            double b0 = w.beta[k];
            double b1 = w.beta[k + 1];
            double b2 = w.beta[k + 2];
            double b3 = w.beta[k + 3];
            double[] v0 = basis[k];
            double[] v1 = basis[k + 1];
            double[] v2 = basis[k + 2];
            double[] v3 = basis[k + 3];
            for (int j = 0; j < n; j++) {
                residual[j] -= b0 * v0[j] + b1 * v1[j] + b2 * v2[j] + b3 * v3[j];
            }
        }
        for (; k < vectors; k++) {
            double bk = w.beta[k];
            double[] v = basis[k];
            for (int j = 0; j < n; j++) {
                residual[j] -= bk * v[j];
            }
        }
        normalEquations(w, g);
        int free = 0;
        for (int q = 0; q < parameters; q++) {
            free += w.held[q] ? 0 : 1;
        }
        double dof = (n - masked) / (double) (n - masked - free);
        double[] squares = w.wy; // the sample is no longer needed: its array takes the squared residual
        for (int j = 0; j < n; j++) {
            squares[j] = Double.isFinite(residual[j]) ? residual[j] * residual[j] : 0;
        }
        information.dot(squares, w.local);
        double[] amounts = new double[nc];
        double[] sd = new double[nc];
        boolean invertible = factorise(w, 0);
        for (int c = 0; c < nc; c++) {
            double highest = curves.get(c).highestAmount();
            amounts[c] = w.theta[c] * highest;
            if (invertible && !w.held[c]) {
                double variance = w.local[c] / informationOfFinitePoints(c, residual, masked) * dof;
                sd[c] = highest * Math.sqrt(variance * inverseDiagonal(w, c)) / w.diagonal[c];
            } else {
                sd[c] = Double.POSITIVE_INFINITY;
            }
        }
        double[] theta = w.theta.clone();
        double s = scale ? theta[parameters - 1] : Double.NaN;
        return new SystemFit(amounts, sd, residual, contributions(theta), iterations, converged, Double.NaN,
                Double.NaN, s, masked);
    }

    private double informationOfFinitePoints(int c, double[] residual, int masked) {
        double sum = informationSum[c];
        for (int j = 0; masked > 0 && j < residual.length; j++) {
            if (!Double.isFinite(residual[j])) {
                sum -= information.at(j, c);
            }
        }
        return sum;
    }

    /** Each compound's fitted absorbance per fit point, computed when asked for (plots only). */
    private IntFunction<double[]> contributions(double[] theta) {
        return c -> {
            double s = scale ? theta[parameters - 1] : 0;
            double[] out = new double[points.size()];
            for (int p = 0; p < CurveOfGrowth.TERMS; p++) {
                double term = curves.get(c).shape(p, theta[c]);
                double[] v = basis[termVector(c, p)];
                for (int j = 0; j < out.length; j++) {
                    out[j] += term * v[j];
                }
                if (scale) {
                    double[] moved = basis[scaleVector(c, p)];
                    for (int j = 0; j < out.length; j++) {
                        out[j] += s * term * moved[j];
                    }
                }
            }
            return out;
        };
    }
}
