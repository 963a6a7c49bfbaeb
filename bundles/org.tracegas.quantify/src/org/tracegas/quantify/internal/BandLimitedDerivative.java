package org.tracegas.quantify.internal;

/**
 * First and second derivatives of uniformly sampled, band-limited data (an FTIR spectrum is band-limited by its
 * sampling), by the derivative of the sinc interpolant truncated to +/- {@link #HALF_WIDTH} points under a
 * Blackman taper. Finite differences would do badly here: lines are often only two or three points wide.
 * Points nearer to an end than the half width see a shortened filter and lose accuracy.
 */
public final class BandLimitedDerivative {

    /** Points on each side of the filter. */
    public static final int HALF_WIDTH = 48;

    private static final double[] FIRST = new double[HALF_WIDTH + 1];
    private static final double[] SECOND = new double[HALF_WIDTH + 1];
    // normalisation of a filter shortened to reach r near the ends, for exactness on low-order polynomials
    private static final double[] FIRST_NORM = new double[HALF_WIDTH + 1];
    private static final double[] SECOND_NORM = new double[HALF_WIDTH + 1];
    private static final double[] SECOND_CENTRE = new double[HALF_WIDTH + 1];

    static {
        // sinc interpolant derivatives at integer offsets m (Whittaker cardinal series; from memory, checked in
        // the test against analytic derivatives): first (-1)^(m+1)/m, second 2(-1)^(m+1)/m^2, -pi^2/3 at m = 0
        for (int m = 1; m <= HALF_WIDTH; m++) {
            double sign = (m % 2 == 0) ? -1 : 1;
            double x = Math.PI * m / (HALF_WIDTH + 1);
            double taper = 0.42 + 0.5 * Math.cos(x) + 0.08 * Math.cos(2 * x);
            FIRST[m] = sign / m * taper;
            SECOND[m] = 2 * sign / ((double) m * m) * taper;
        }
        // the taper (and near the ends the shortening) spoils exactness on low-order polynomials; restore it, so
        // that a straight baseline has exactly its own slope and no curvature
        double linear = 0;
        double quadratic = 0;
        double constant = 0;
        for (int r = 1; r <= HALF_WIDTH; r++) {
            linear += 2 * r * FIRST[r];
            quadratic += (double) r * r * SECOND[r];
            constant += 2 * SECOND[r];
            FIRST_NORM[r] = 1 / linear;
            SECOND_NORM[r] = 1 / quadratic;
            SECOND_CENTRE[r] = -constant / quadratic;
        }
    }

    private BandLimitedDerivative() {
    }

    /**
     * @param values samples at equal steps
     * @param step   sample step (signed: a descending axis has a negative step)
     * @param order  1 or 2
     */
    public static double[] of(double[] values, double step, int order) {
        if (order != 1 && order != 2) {
            throw new IllegalArgumentException("order must be 1 or 2, was " + order);
        }
        int n = values.length;
        if (n < 3) {
            throw new IllegalArgumentException("derivatives need at least 3 points, had " + n);
        }
        double[] d = new double[n];
        for (int i = 0; i < n; i++) {
            int reach = Math.min(HALF_WIDTH, Math.min(i, n - 1 - i));
            if (reach == 0) {
                d[i] = endPoint(values, step, order, i == 0 ? 1 : n - 2, i == 0 ? -1 : 1);
                continue;
            }
            double sum = 0;
            if (order == 1) {
                for (int m = 1; m <= reach; m++) {
                    sum += FIRST[m] * (values[i + m] - values[i - m]);
                }
                d[i] = sum * FIRST_NORM[reach] / step;
            } else {
                sum = SECOND_CENTRE[reach] * values[i];
                for (int m = 1; m <= reach; m++) {
                    sum += SECOND[m] * (values[i + m] + values[i - m]) * SECOND_NORM[reach];
                }
                d[i] = sum / (step * step);
            }
        }
        return d;
    }

    /** Parabola through the end point and its two neighbours (centre c), evaluated one step outward. */
    private static double endPoint(double[] v, double step, int order, int c, int outward) {
        double second = (v[c - 1] - 2 * v[c] + v[c + 1]) / (step * step);
        if (order == 2) {
            return second;
        }
        return (v[c + 1] - v[c - 1]) / (2 * step) + second * outward * step;
    }
}
