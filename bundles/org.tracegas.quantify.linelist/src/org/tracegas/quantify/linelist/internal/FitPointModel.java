package org.tracegas.quantify.linelist.internal;

import java.util.Arrays;

import org.apache.commons.math3.fitting.leastsquares.ValueAndJacobianFunction;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.RealVector;
import org.apache.commons.math3.util.Pair;

/**
 * The model absorbance of one line-list fit at its fit points, -log10 of the mixture's observed transmittance read
 * at nu / (1 + scale) plus the baseline polynomials, and its Jacobian, for one sample's fit by one thread.
 * <p>
 * Why apart: the Levenberg-Marquardt optimizer, asked to evaluate lazily, wants the values at every trial point but
 * the Jacobian only where a step was accepted, and it asks for the same point's values more than once (residuals,
 * cost, convergence check). The values cost the exponential and one convolution on the fine grid, the Jacobian one
 * more convolution per compound; so the values of the last {@value #REMEMBERED} points are remembered, the Jacobian
 * is computed only when asked, and it reuses the monochromatic transmittance of the last point whose values were
 * computed. The fine-grid arrays are allocated once per fit. The numbers are those of computing values and Jacobian
 * together at every point, only fewer of them are computed.
 */
final class FitPointModel implements ValueAndJacobianFunction {

    private static final double LN10 = Math.log(10);
    /** Floor of the observed transmittance: the line shape's side lobes may dip a saturated line below zero. */
    static final double LEAST_TRANSMITTANCE = 1e-12;
    /** Points whose values are remembered: the current, the previous accepted one and the trials between. */
    private static final int REMEMBERED = 4;

    private final MixtureModel mixture;
    private final CubicReader reader;
    private final double[] nu;          // wavenumber per fit point
    private final double[][] baseline;  // [term][fit point]
    private final int[] rows;           // fit points evaluated
    private final boolean scale;
    private final int parameters;

    private final double[] monochromatic;
    private final double[] observed;
    private final double[] derivative;
    /** T ln 10 per evaluated fit point, T the observed transmittance, for the amounts' columns. */
    private final double[] tLn10;
    /** The parameters at which monochromatic and observed hold, null before the first evaluation. */
    private double[] observedAt;
    private final double[][] rememberedAt = new double[REMEMBERED][];
    private final double[][] rememberedValues = new double[REMEMBERED][];
    private int nextRemembered;

    /**
     * @param mixture  the mixture's model
     * @param nu       wavenumber of each fit point
     * @param baseline baseline terms, [term][fit point]
     * @param rows     the fit points evaluated, indices into nu
     * @param scale    whether the last parameter is a relative wavenumber scale
     */
    FitPointModel(MixtureModel mixture, double[] nu, double[][] baseline, int[] rows, boolean scale) {
        this.mixture = mixture;
        this.reader = new CubicReader(mixture.grid());
        this.nu = nu;
        this.baseline = baseline;
        this.rows = rows;
        this.scale = scale;
        this.parameters = mixture.compounds() + baseline.length + (scale ? 1 : 0);
        int size = mixture.grid().size();
        this.monochromatic = new double[size];
        this.observed = new double[size];
        this.derivative = new double[size];
        this.tLn10 = new double[rows.length];
    }

    @Override
    public RealVector computeValue(double[] theta) {
        for (int r = 0; r < REMEMBERED; r++) {
            if (Arrays.equals(rememberedAt[r], theta)) {
                return new ArrayRealVector(rememberedValues[r]);
            }
        }
        observeAt(theta);
        int nc = mixture.compounds();
        double s = scale ? theta[theta.length - 1] : 0;
        double[] values = new double[rows.length];
        double[] read = new double[2];
        for (int k = 0; k < rows.length; k++) {
            int j = rows[k];
            reader.read(observed, nu[j] / (1 + s), read);
            double value = -Math.log10(Math.max(read[0], LEAST_TRANSMITTANCE));
            for (int b = 0; b < baseline.length; b++) {
                value += theta[nc + b] * baseline[b][j];
            }
            values[k] = value;
        }
        rememberedAt[nextRemembered] = theta.clone();
        rememberedValues[nextRemembered] = values;
        nextRemembered = (nextRemembered + 1) % REMEMBERED;
        return new ArrayRealVector(values);
    }

    @Override
    public RealMatrix computeJacobian(double[] theta) {
        if (!Arrays.equals(observedAt, theta)) {
            observeAt(theta);
        }
        int nc = mixture.compounds();
        int nb = baseline.length;
        double s = scale ? theta[theta.length - 1] : 0;
        double[] amounts = Arrays.copyOf(theta, nc);
        double[][] jacobian = new double[rows.length][parameters];
        double[] read = new double[2];
        for (int k = 0; k < rows.length; k++) {
            int j = rows[k];
            double at = nu[j] / (1 + s);
            reader.read(observed, at, read);
            double t = Math.max(read[0], LEAST_TRANSMITTANCE);
            tLn10[k] = t * LN10;
            for (int b = 0; b < nb; b++) {
                jacobian[k][nc + b] = baseline[b][j];
            }
            if (scale) {
                // d/ds of -log10 T(nu / (1 + s)) = (nu / (1 + s)^2) T'(at) / (T ln 10)
                jacobian[k][nc + nb] = nu[j] / ((1 + s) * (1 + s)) * read[1] / (t * LN10);
            }
        }
        for (int c = 0; c < nc; c++) {
            mixture.derivative(c, amounts, monochromatic, derivative);
            for (int k = 0; k < rows.length; k++) {
                reader.read(derivative, nu[rows[k]] / (1 + s), read);
                jacobian[k][c] = -read[0] / tLn10[k];
            }
        }
        return new Array2DRowRealMatrix(jacobian, false);
    }

    @Override
    public Pair<RealVector, RealMatrix> value(RealVector point) {
        double[] theta = point.toArray();
        return new Pair<>(computeValue(theta), computeJacobian(theta));
    }

    private void observeAt(double[] theta) {
        mixture.observe(Arrays.copyOf(theta, mixture.compounds()), monochromatic, observed);
        observedAt = theta.clone();
    }
}
