package org.tracegas.ui.chart;

import java.util.Arrays;

/**
 * Thins a monotonic series for drawing: within each pixel column only the lowest and the highest point are
 * kept, in their original order, so peaks, spikes and the outline look exactly as with all points while the
 * number of points drawn is at most about two per column. The nearest point outside each end of the visible
 * range is kept too, so lines run on to the plot edges.
 */
public final class MinMaxDecimator {

    private MinMaxDecimator() {
    }

    /** Points kept for drawing. */
    public record Decimated(double[] x, double[] y) {
        public int size() {
            return x.length;
        }
    }

    /**
     * @param x       abscissae, ascending or descending
     * @param y       ordinates, same length; NaN points are left out
     * @param from    one end of the visible range
     * @param to      the other end, different from {@code from}
     * @param columns pixel columns across the visible range, at least 1
     * @throws IllegalArgumentException naming the argument that is wrong
     */
    public static Decimated decimate(double[] x, double[] y, double from, double to, int columns) {
        if (x.length != y.length) {
            throw new IllegalArgumentException("y has " + y.length + " points, x has " + x.length);
        }
        if (columns < 1) {
            throw new IllegalArgumentException("columns must be at least 1, was " + columns);
        }
        if (!(from != to) || !Double.isFinite(from) || !Double.isFinite(to)) {
            throw new IllegalArgumentException("visible range must be finite and not empty, was " + from + " to " + to);
        }
        double lo = Math.min(from, to);
        double hi = Math.max(from, to);
        double scale = columns / (hi - lo);
        double[] ox = new double[2 * columns + 4];
        double[] oy = new double[ox.length];
        int n = 0;
        int lastOutsideBefore = -1;
        boolean seenInside = false;
        int column = -1;
        int minIndex = -1;
        int maxIndex = -1;
        for (int i = 0; i < x.length; i++) {
            if (Double.isNaN(y[i])) {
                continue;
            }
            if (x[i] < lo || x[i] > hi) {
                if (!seenInside) {
                    lastOutsideBefore = i;
                } else {
                    // first point past the far end: flush and stop, the series is monotonic
                    n = flush(x, y, minIndex, maxIndex, ox, oy, n);
                    minIndex = -1;
                    ox[n] = x[i];
                    oy[n++] = y[i];
                    break;
                }
                continue;
            }
            if (!seenInside) {
                seenInside = true;
                if (lastOutsideBefore >= 0) {
                    ox[n] = x[lastOutsideBefore];
                    oy[n++] = y[lastOutsideBefore];
                }
            }
            int c = Math.min(columns - 1, (int) ((x[i] - lo) * scale));
            if (c != column) {
                n = flush(x, y, minIndex, maxIndex, ox, oy, n);
                column = c;
                minIndex = i;
                maxIndex = i;
            } else if (y[i] < y[minIndex]) {
                minIndex = i;
            } else if (y[i] > y[maxIndex]) {
                maxIndex = i;
            }
        }
        n = flush(x, y, minIndex, maxIndex, ox, oy, n);
        return new Decimated(Arrays.copyOf(ox, n), Arrays.copyOf(oy, n));
    }

    private static int flush(double[] x, double[] y, int minIndex, int maxIndex, double[] ox, double[] oy, int n) {
        if (minIndex < 0) {
            return n;
        }
        int first = Math.min(minIndex, maxIndex);
        int second = Math.max(minIndex, maxIndex);
        ox[n] = x[first];
        oy[n++] = y[first];
        if (second != first) {
            ox[n] = x[second];
            oy[n++] = y[second];
        }
        return n;
    }
}
