package org.tracegas.quantify.internal;

import java.util.Arrays;
import java.util.List;

import org.apache.commons.math3.exception.MaxCountExceededException;

import org.tracegas.quantify.AnalysisRegion;
import org.tracegas.quantify.ShiftTerm;

/**
 * One least-squares system: a set of compounds fitted together over a set of regions, each region with its own
 * polynomial baseline. Everything that does not depend on the sample is computed in the constructor.
 * <p>
 * Columns: one per compound (absorptivity in absorbance per ppm·m, so coefficients are ppm·m), then the baseline
 * terms region by region, then for a shift fit the shift (cm-1) and optionally the width change (cm-2).
 */
public final class FitSystem {

    private final String label;
    private final List<Absorptivity> compounds;
    private final int[] rows;          // sample axis indices, region by region
    private final int[] regionStart;   // index into rows where each region starts; last entry = rows.length
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
     * @param regions       the regions
     * @param wavenumbers   the sample axis
     * @param axisWeights   weight per sample axis point, or null
     * @param nonlinearity  whether to interpolate between references at the current estimate
     * @param shiftTerm     the non-linear line position terms
     * @param tolerance     relative convergence tolerance of the non-linear iteration
     * @param maxIterations iteration cap
     * @throws IllegalArgumentException if a region holds too few axis points, a reference does not cover a
     *                                  region, or the design cannot be solved
     */
    public FitSystem(String label, List<Absorptivity> compounds, List<AnalysisRegion> regions, double[] wavenumbers,
            double[] axisWeights, boolean nonlinearity, ShiftTerm shiftTerm, double tolerance, int maxIterations) {
        this.label = label;
        this.compounds = List.copyOf(compounds);
        this.shiftTerm = shiftTerm;
        this.tolerance = tolerance;
        this.maxIterations = maxIterations;
        int nr = regions.size();
        this.regionStart = new int[nr + 1];
        int[] buffer = new int[wavenumbers.length * nr];
        int count = 0;
        int terms = 0;
        for (int r = 0; r < nr; r++) {
            regionStart[r] = count;
            AnalysisRegion region = regions.get(r);
            for (int i = 0; i < wavenumbers.length; i++) {
                if (region.contains(wavenumbers[i])) {
                    buffer[count++] = i;
                }
            }
            if (count - regionStart[r] <= region.baselineOrder() + 1) {
                throw new IllegalArgumentException(label + ": region " + r + " (" + region.windows()
                        + ") holds " + (count - regionStart[r]) + " sample axis points, too few for its baseline");
            }
            terms += region.baselineOrder() + 1;
        }
        regionStart[nr] = count;
        this.rows = Arrays.copyOf(buffer, count);
        this.weights = axisWeights == null ? null : gather(axisWeights);
        if (weights != null) {
            for (int j = 0; j < count; j++) {
                if (!(weights[j] > 0 && Double.isFinite(weights[j]))) {
                    throw new IllegalArgumentException(label + ": weights do not extend to "
                            + wavenumbers[rows[j]] + " cm-1");
                }
            }
        }
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
        this.baseline = new double[terms][count];
        int t = 0;
        for (int r = 0; r < nr; r++) {
            AnalysisRegion region = regions.get(r);
            double mid = (region.low() + region.high()) / 2;
            double half = (region.high() - region.low()) / 2;
            for (int o = 0; o <= region.baselineOrder(); o++, t++) {
                for (int j = regionStart[r]; j < regionStart[r + 1]; j++) {
                    // wavenumber mapped onto [-1, 1] over the region keeps the powers comparable in size
                    baseline[t][j] = Math.pow((wavenumbers[rows[j]] - mid) / half, o);
                }
            }
        }
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

    private double[] gather(double[] full) {
        double[] out = new double[rows.length];
        for (int j = 0; j < rows.length; j++) {
            out[j] = full[rows[j]];
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

    public String label() {
        return label;
    }

    public List<Absorptivity> compounds() {
        return compounds;
    }

    public int regions() {
        return regionStart.length - 1;
    }

    /** Sample axis indices of the fit points, region by region. */
    public int[] rows() {
        return rows.clone();
    }

    public int regionStart(int region) {
        return regionStart[region];
    }

    /** Fits one sample given as absorbance on the full sample axis. */
    public SystemFit fit(double[] sample) {
        double[] y = gather(sample);
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
        return new SystemFit(solution.coefficients(), sd, solution.residualUnsafe(), columns, iterations, converged,
                Double.NaN, Double.NaN);
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
        return new SystemFit(amounts, sd, fit.residual(), columns, iterations + fit.iterations(), converged, shift,
                width ? w : Double.NaN);
    }
}
