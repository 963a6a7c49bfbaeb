package org.tracegas.quantify.internal;

import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.QRDecomposition;
import org.apache.commons.math3.linear.RealMatrix;

/**
 * The curve of growth of one compound: its absorbance at every spectral point as a smooth, monotone function of
 * the amount, through the origin and fixed by the references.
 * <p>
 * Form: at each point A = x1 u + x2 v + x3 v^2, u = amount / highest reference, v = u / sqrt(1 + {@link #BEND} |u|)
 * the bent amount, fitted through the origin to the references by least squares; with three references (or
 * fewer, then with as many terms) it passes through every reference, and with one it is the Beer-Lambert line.
 * Why: the absorbance a
 * spectrometer reports for a line narrower than its line shape is the logarithm of the line-shape average of
 * exp(-k amount) (Beer-Lambert law applied before the instrument, as Griffith, Appl. Spectrosc. 50, 59 (1996)
 * describes), an analytic function of the amount that starts as k u and bends over smoothly towards square-root
 * growth as the line saturates; the bent variable takes up most of that bend, and three references fix how much
 * of it each point shows.
 * Monotone: where the polynomial would turn back anywhere between zero and the highest reference (weak points, where
 * the references hold little but noise), terms are dropped from the last until it does not; the Beer-Lambert line
 * always is. Overlapping lines of different compounds are added as absorbances: exact where they do not
 * overlap within the instrument line shape, and in error where saturated lines of two compounds coincide within
 * it, since the instrument averages their joint transmittance. Above the highest reference the polynomial is an
 * extrapolation, and results there are flagged.
 * <p>
 * References are put onto the sample points band-limited ({@link BandLimitedResampler}), so they need uniform
 * axes.
 */
public final class CurveOfGrowth {

    /** Number of terms of the curve, the most references it can pass through. */
    public static final int TERMS = 3;

    /**
     * Bend of the amount variable, v = u / sqrt(1 + BEND |u|), with u the amount over the highest reference: the
     * form in which the equivalent width of an isolated pressure-broadened line grows, from linear to square root
     * (Ladenburg-Reiche growth, in the Rodgers-Williams approximation W = S u / sqrt(1 + S u / (4 gamma)), from
     * memory), here with the bend at the highest reference. Checked on line-by-line spectra of single compounds
     * (the accuracy test's generator): the error between references falls from 3e-3 of the highest amount for a
     * cubic polynomial in u to 1e-4 with BEND = 1; a bend of 2 or 4 does worse (5e-4).
     */
    static final double BEND = 1;

    private final String compound;
    private final double[] amounts;               // ascending ppm·m
    private final BandLimitedResampler[] value;   // absorbance of each reference
    private final BandLimitedResampler[] slope;   // its derivative in wavenumber
    private final double[][][] fits;              // [terms - 1][term][reference]: least squares through 0

    /**
     * @param compound   compound name, for messages
     * @param amounts    ppm·m of each reference, strictly ascending
     * @param first      first wavenumber of each reference's uniform axis
     * @param step       step of each reference's uniform axis
     * @param absorbance absorbance of each reference
     */
    public CurveOfGrowth(String compound, double[] amounts, double[] first, double[] step, double[][] absorbance) {
        this.compound = compound;
        this.amounts = amounts.clone();
        int m = amounts.length;
        this.value = new BandLimitedResampler[m];
        this.slope = new BandLimitedResampler[m];
        for (int i = 0; i < m; i++) {
            if (i > 0 && !(amounts[i] > amounts[i - 1])) {
                throw new IllegalArgumentException("amounts of " + compound + " must ascend strictly");
            }
            value[i] = new BandLimitedResampler(first[i], step[i], absorbance[i]);
            slope[i] = new BandLimitedResampler(first[i], step[i],
                    BandLimitedDerivative.of(absorbance[i], step[i], 1));
        }
        int most = Math.min(m, TERMS);
        this.fits = new double[most][][];
        double highest = amounts[m - 1];
        for (int d = 1; d <= most; d++) {
            RealMatrix x = new Array2DRowRealMatrix(m, d);
            for (int i = 0; i < m; i++) {
                for (int p = 0; p < d; p++) {
                    x.setEntry(i, p, shape(p, amounts[i] / highest));
                }
            }
            // the least-squares operator (X^T X)^-1 X^T, from the pseudo-inverse of X
            fits[d - 1] = new QRDecomposition(x).getSolver().getInverse().getData();
        }
    }

    /** Term p of the curve at scaled amount u: u, v, v^2 with v = u / sqrt(1 + BEND |u|). */
    public double shape(int p, double u) {
        double v = u / Math.sqrt(1 + BEND * Math.abs(u));
        return p == 0 ? u : p == 1 ? v : v * v;
    }

    /** Derivative of term p by the scaled amount. */
    public double shapeSlope(int p, double u) {
        double q = 1 + BEND * Math.abs(u);
        double v = u / Math.sqrt(q);
        double dv = (1 + BEND * Math.abs(u) / 2) / (q * Math.sqrt(q));
        return p == 0 ? 1 : p == 1 ? dv : 2 * v * dv;
    }

    public String compound() {
        return compound;
    }

    public double highestAmount() {
        return amounts[amounts.length - 1];
    }

    public double lowestAmount() {
        return amounts[0];
    }

    /**
     * The coefficients of the curve's terms ({@link #shape(int, double)}) at the fit points, [term][point], with
     * the amount scaled by {@link #highestAmount()}; and if asked for, their derivatives in wavenumber in the same
     * layout.
     *
     * @param label       names the fit in messages
     * @param wavenumbers wavenumber of each fit point
     * @param derivative  whether to return the derivatives as well (then element 1, else null)
     * @throws IllegalArgumentException if a reference does not extend to a fit point
     */
    public double[][][] onPoints(String label, double[] wavenumbers, boolean derivative) {
        int n = wavenumbers.length;
        int m = amounts.length;
        double[][] coefficients = new double[TERMS][n];
        double[][] slopes = derivative ? new double[TERMS][n] : null;
        double[] a = new double[m];
        double[] da = new double[m];
        double[] x = new double[TERMS];
        for (int j = 0; j < n; j++) {
            double nu = wavenumbers[j];
            for (int i = 0; i < m; i++) {
                if (!value[i].covers(nu)) {
                    throw new IllegalArgumentException(label + ": reference of " + compound + " at " + amounts[i]
                            + " ppm·m does not extend to " + nu + " cm-1");
                }
                a[i] = value[i].at(nu);
                da[i] = derivative ? slope[i].at(nu) : 0;
            }
            int d = fits.length;
            while (true) {
                apply(fits[d - 1], a, x, d);
                if (d == 1 || monotone(x)) {
                    break;
                }
                d--;
            }
            for (int p = 0; p < TERMS; p++) {
                coefficients[p][j] = x[p];
            }
            if (derivative) {
                // the derivative of the same per-point fit: the curve of growth at a slightly moved wavenumber
                apply(fits[d - 1], da, x, d);
                for (int p = 0; p < TERMS; p++) {
                    slopes[p][j] = x[p];
                }
            }
        }
        return new double[][][] {coefficients, slopes};
    }

    private static void apply(double[][] fit, double[] a, double[] x, int terms) {
        java.util.Arrays.fill(x, 0);
        for (int p = 0; p < terms; p++) {
            double sum = 0;
            for (int i = 0; i < a.length; i++) {
                sum += fit[p][i] * a[i];
            }
            x[p] = sum;
        }
    }

    /** Whether the curve with these coefficients keeps the sign of its value at u = 1 in its slope over [0, 1]. */
    private boolean monotone(double[] x) {
        double end = 0;
        for (int p = 0; p < TERMS; p++) {
            end += x[p] * shape(p, 1);
        }
        double sign = Math.signum(end);
        for (int i = 0; i <= MONOTONE_CHECKS; i++) {
            double u = i / (double) MONOTONE_CHECKS;
            double slope = 0;
            for (int p = 0; p < TERMS; p++) {
                slope += x[p] * shapeSlope(p, u);
            }
            if (sign * slope < 0) {
                return false;
            }
        }
        return true;
    }

    private static final int MONOTONE_CHECKS = 40;
}
