package org.tracegas.quantify.internal;

import java.util.Arrays;
import java.util.List;

import org.apache.commons.math3.exception.MaxCountExceededException;

import org.tracegas.quantify.ShiftTerm;

/**
 * The classical least-squares fit of one system: a set of compounds fitted together over a set of regions, each
 * region with its own polynomial baseline, optionally with the absorptivity interpolated between references at the
 * current estimate and with line position terms. Everything that does not depend on the sample is computed in the
 * constructor.
 * <p>
 * Columns: one per compound (absorptivity in absorbance per ppm·m, so coefficients are ppm·m), then the baseline
 * terms region by region, then for a shift fit the shift (cm-1) and optionally the width change (cm-2).
 */
public final class FitSystem implements SystemSolver {

    private final String label;
    private final List<Absorptivity> compounds;
    private final FitPoints points;
    private final int[] rows;          // sample axis indices, region by region
    private final double[] weights;    // per row, or null
    private final double[][][] k;      // [compound][reference][row] absorptivity
    private final double[][][] k1;     // first derivative, only for a shift fit
    private final double[][][] k2;     // second derivative, only for a shift fit
    private final double[][] baseline; // [term][row]
    private final double[][] pooledColumns;
    private final LinearDesign pooledDesign;
    private final boolean iterate;
    private final ShiftTerm shiftTerm;
    private final double tolerance;
    private final int maxIterations;

    /**
     * @param label         names the system in messages, for example "fit of CO"
     * @param compounds     compound columns in order
     * @param points        the fit points, regions and baselines
     * @param wavenumbers   the sample axis
     * @param nonlinearity  whether to interpolate between references at the current estimate
     * @param shiftTerm     the non-linear line position terms: NONE, SHIFT or SHIFT_AND_WIDTH
     * @param tolerance     relative convergence tolerance of the non-linear iteration
     * @param maxIterations iteration cap
     * @throws IllegalArgumentException if a reference does not cover a region, the design cannot be solved or the
     *                                  shift term is one this fit does not offer
     */
    public FitSystem(String label, List<Absorptivity> compounds, FitPoints points, double[] wavenumbers,
            boolean nonlinearity, ShiftTerm shiftTerm, double tolerance, int maxIterations) {
        if (shiftTerm == ShiftTerm.SCALE) {
            throw new IllegalArgumentException(label + ": the classical least-squares fit offers no " + shiftTerm
                    + " term");
        }
        this.label = label;
        this.compounds = List.copyOf(compounds);
        this.points = points;
        this.shiftTerm = shiftTerm;
        this.tolerance = tolerance;
        this.maxIterations = maxIterations;
        this.rows = points.rows();
        this.weights = points.weightsUnsafe();
        this.baseline = points.baselineUnsafe();
        int nc = compounds.size();
        boolean shift = shiftTerm != ShiftTerm.NONE;
        this.k = new double[nc][][];
        this.k1 = shift ? new double[nc][][] : null;
        this.k2 = shift ? new double[nc][][] : null;
        boolean multi = false;
        for (int c = 0; c < nc; c++) {
            Absorptivity a = compounds.get(c);
            multi |= a.references() > 1;
            k[c] = onRows(a, 0, wavenumbers);
            if (shift) {
                k1[c] = onRows(a, 1, wavenumbers);
                k2[c] = onRows(a, 2, wavenumbers);
            }
        }
        this.iterate = nonlinearity && multi;
        this.pooledColumns = new double[nc][];
        for (int c = 0; c < nc; c++) {
            pooledColumns[c] = mix(k[c], compounds.get(c).pooledMix());
        }
        this.pooledDesign = design(pooledColumns);
    }

    private double[][] onRows(Absorptivity a, int order, double[] wavenumbers) {
        double[][] out = new double[a.references()][rows.length];
        for (int i = 0; i < a.references(); i++) {
            for (int j = 0; j < rows.length; j++) {
                double nu = wavenumbers[rows[j]];
                if (!a.covers(i, nu)) {
                    throw new IllegalArgumentException(label + ": reference of " + a.compound() + " at "
                            + a.amount(i) + " ppm·m does not extend to " + nu + " cm-1");
                }
                out[i][j] = a.at(i, order, nu);
            }
        }
        return out;
    }

    private static double[] mix(double[][] perReference, double[] mix) {
        int n = perReference[0].length;
        double[] out = new double[n];
        for (int i = 0; i < mix.length; i++) {
            double m = mix[i];
            if (m != 0) {
                double[] ref = perReference[i];
                for (int j = 0; j < n; j++) {
                    out[j] += m * ref[j];
                }
            }
        }
        return out;
    }

    private LinearDesign design(double[][] compoundColumns) {
        double[][] all = new double[compoundColumns.length + baseline.length][];
        System.arraycopy(compoundColumns, 0, all, 0, compoundColumns.length);
        System.arraycopy(baseline, 0, all, compoundColumns.length, baseline.length);
        return LinearDesign.of(all, weights, label);
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
        return compounds.get(column).compound();
    }

    @Override
    public double highestAmount(int column) {
        return compounds.get(column).highestAmount();
    }

    /**
     * {@inheritDoc}
     *
     * @throws IllegalArgumentException if the sample is not finite at a fit point (the message names the index)
     */
    @Override
    public SystemFit fit(double[] sample) {
        for (int i : rows) {
            if (!Double.isFinite(sample[i])) {
                throw new IllegalArgumentException("sample absorbance at index " + i + " is not finite: " + sample[i]);
            }
        }
        double[] y = points.gather(sample);
        int nc = compounds.size();
        LinearSolution solution = pooledDesign.solve(y);
        double[][] mixes = new double[nc][];
        double[][] columns = pooledColumns;
        for (int c = 0; c < nc; c++) {
            mixes[c] = compounds.get(c).pooledMix();
        }
        int iterations = 0;
        boolean converged = true;
        if (iterate) {
            converged = false;
            while (!converged && iterations < maxIterations) {
                columns = new double[nc][];
                for (int c = 0; c < nc; c++) {
                    mixes[c] = compounds.get(c).effectiveMix(solution.coefficient(c));
                    columns[c] = mix(k[c], mixes[c]);
                }
                LinearSolution next = design(columns).solve(y);
                iterations++;
                converged = true;
                for (int c = 0; c < nc; c++) {
                    double change = Math.abs(next.coefficient(c) - solution.coefficient(c));
                    double scale = Math.max(Math.abs(next.coefficient(c)), compounds.get(c).lowestAmount());
                    converged &= change <= tolerance * scale;
                }
                solution = next;
            }
        }
        if (shiftTerm == ShiftTerm.NONE || !anyDetected(solution)) {
            // without a compound above its detection limit there are no lines to place: no shift is defined
            return linearFit(solution, columns, iterations, converged);
        }
        try {
            return fitShift(y, solution, mixes, iterations, converged);
        } catch (MaxCountExceededException e) {
            // no optimum within the cap: report the fit without line position terms, marked as not converged
            return linearFit(solution, columns, iterations, false);
        }
    }

    /** Whether some compound exceeds three standard deviations (its detection limit) in a linear solution. */
    private boolean anyDetected(LinearSolution solution) {
        for (int c = 0; c < compounds.size(); c++) {
            if (Math.abs(solution.coefficient(c)) > 3 * solution.standardDeviation(c)) {
                return true;
            }
        }
        return false;
    }

    /**
     * The standard deviations come from the final design; after the non-linear iteration that design holds the
     * effective absorptivities, so they do not include the slope of the absorptivity with the amount.
     */
    private SystemFit linearFit(LinearSolution solution, double[][] columns, int iterations, boolean converged) {
        double[] sd = new double[compounds.size()];
        for (int c = 0; c < sd.length; c++) {
            sd[c] = solution.standardDeviation(c);
        }
        double[] amounts = solution.coefficients();
        return new SystemFit(amounts, sd, solution.residualUnsafe(), SystemFit.linear(columns, amounts), iterations,
                converged, Double.NaN, Double.NaN, Double.NaN, 0);
    }

    private SystemFit fitShift(double[] y, LinearSolution linear, double[][] mixes, int iterations,
            boolean converged) {
        int nc = compounds.size();
        int nb = baseline.length;
        boolean width = shiftTerm == ShiftTerm.SHIFT_AND_WIDTH;
        double[][] kc = new double[nc][];
        double[][] k1c = new double[nc][];
        double[][] k2c = new double[nc][];
        for (int c = 0; c < nc; c++) {
            kc[c] = mix(k[c], mixes[c]);
            k1c[c] = mix(k1[c], mixes[c]);
            k2c[c] = mix(k2[c], mixes[c]);
        }
        int p = nc + nb + (width ? 2 : 1);
        double[] start = new double[p];
        System.arraycopy(linear.coefficients(), 0, start, 0, nc + nb);
        ModelFunction model = (q, values, jacobian) -> {
            double shift = q[nc + nb];
            double w = width ? q[nc + nb + 1] : 0;
            // second-order expansion of k(nu - shift) plus a Gaussian broadening of variance w
            double c1 = -shift;
            double c2 = (shift * shift + w) / 2;
            for (int j = 0; j < y.length; j++) {
                double v = 0;
                double dShift = 0;
                double dWidth = 0;
                for (int c = 0; c < nc; c++) {
                    double column = kc[c][j] + c1 * k1c[c][j] + c2 * k2c[c][j];
                    jacobian[j][c] = column;
                    v += q[c] * column;
                    dShift += q[c] * (-k1c[c][j] + shift * k2c[c][j]);
                    dWidth += q[c] * k2c[c][j] / 2;
                }
                for (int b = 0; b < nb; b++) {
                    jacobian[j][nc + b] = baseline[b][j];
                    v += q[nc + b] * baseline[b][j];
                }
                jacobian[j][nc + nb] = dShift;
                if (width) {
                    jacobian[j][nc + nb + 1] = dWidth;
                }
                values[j] = v;
            }
        };
        NonlinearFit fit = new LevenbergMarquardt(maxIterations, tolerance).fit(model, y, weights,
                start);
        double[] q = fit.parameters();
        double shift = q[nc + nb];
        double w = width ? q[nc + nb + 1] : 0;
        double[][] columns = new double[nc][y.length];
        for (int c = 0; c < nc; c++) {
            for (int j = 0; j < y.length; j++) {
                columns[c][j] = kc[c][j] - shift * k1c[c][j] + (shift * shift + w) / 2 * k2c[c][j];
            }
        }
        double[] amounts = Arrays.copyOf(q, nc);
        double[] sd = Arrays.copyOf(fit.standardDeviations(), nc);
        return new SystemFit(amounts, sd, fit.residual(), SystemFit.linear(columns, amounts),
                iterations + fit.iterations(), converged, shift,
                width ? w : Double.NaN, Double.NaN, 0);
    }
}
