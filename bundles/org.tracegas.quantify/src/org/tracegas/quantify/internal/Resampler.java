package org.tracegas.quantify.internal;

import java.util.Arrays;

/** Linear interpolation of values given on a strictly monotonic axis. */
public final class Resampler {

    private final double[] x; // ascending
    private final double[] y;

    /**
     * @param axis   strictly monotonic axis (ascending or descending)
     * @param values one value per axis point
     */
    public Resampler(double[] axis, double[] values) {
        if (axis.length != values.length || axis.length < 2) {
            throw new IllegalArgumentException("resampling needs at least 2 points and one value per axis point, had "
                    + axis.length + " axis points and " + values.length + " values");
        }
        boolean ascending = axis[1] > axis[0];
        int n = axis.length;
        this.x = new double[n];
        this.y = new double[n];
        for (int i = 0; i < n; i++) {
            int k = ascending ? i : n - 1 - i;
            x[i] = axis[k];
            y[i] = values[k];
        }
    }

    public double low() {
        return x[0];
    }

    public double high() {
        return x[x.length - 1];
    }

    public boolean covers(double at) {
        return at >= x[0] && at <= x[x.length - 1];
    }

    /** Interpolated value; outside the axis the nearest end value. */
    public double at(double at) {
        int n = x.length;
        if (at <= x[0]) {
            return y[0];
        }
        if (at >= x[n - 1]) {
            return y[n - 1];
        }
        int i = Arrays.binarySearch(x, at);
        if (i >= 0) {
            return y[i];
        }
        int hi = -i - 1;
        int lo = hi - 1;
        double t = (at - x[lo]) / (x[hi] - x[lo]);
        return y[lo] + t * (y[hi] - y[lo]);
    }

    /**
     * First (order 1) or second (order 2) derivative by three-point finite differences on the given, possibly
     * non-uniform axis (one-sided at the ends).
     */
    public static double[] derivative(double[] axis, double[] values, int order) {
        int n = axis.length;
        double[] d = new double[n];
        for (int i = 0; i < n; i++) {
            int c = Math.max(1, Math.min(n - 2, i)); // centre of the three points used
            double x0 = axis[c - 1], x1 = axis[c], x2 = axis[c + 1];
            double y0 = values[c - 1], y1 = values[c], y2 = values[c + 1];
            double h0 = x1 - x0, h1 = x2 - x1;
            // Lagrange parabola through the three points, differentiated at axis[i]
            double second = 2 * (y0 / (h0 * (h0 + h1)) - y1 / (h0 * h1) + y2 / (h1 * (h0 + h1)));
            if (order == 2) {
                d[i] = second;
            } else {
                double slopeAtCentre = (y2 - y1) / h1 * h0 / (h0 + h1) + (y1 - y0) / h0 * h1 / (h0 + h1);
                d[i] = slopeAtCentre + second * (axis[i] - x1);
            }
        }
        return d;
    }
}
