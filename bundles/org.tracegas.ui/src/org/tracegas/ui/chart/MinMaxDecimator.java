package org.tracegas.ui.chart;

import java.util.Arrays;

/**
 * Thins a monotonic series for drawing: within each pixel column only the lowest and the highest point are
 * kept, in their original order, so peaks, spikes and the outline look exactly as with all points while the
 * number of points drawn is at most about two per column. The nearest point outside each end of the visible
 * range is kept too, so lines run on to the plot edges. A NaN value between kept points becomes a NaN in the
 * output, so gaps (e.g. outside the fitted windows) stay gaps.
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
     * @param y       ordinates, same length; a run of NaN values becomes one NaN point (a gap)
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
        Out out = new Out(2 * columns + 4);
        int lastOutsideBefore = -1;
        boolean seenInside = false;
        int column = -1;
        int minIndex = -1;
        int maxIndex = -1;
        for (int i = 0; i < x.length; i++) {
            if (Double.isNaN(y[i])) {
                if (seenInside && x[i] >= lo && x[i] <= hi) {
                    flush(x, y, minIndex, maxIndex, out);
                    minIndex = -1;
                    column = -1;
                    out.gap();
                }
                continue;
            }
            if (x[i] < lo || x[i] > hi) {
                if (!seenInside) {
                    lastOutsideBefore = i;
                } else {
                    // first point past the far end: flush and stop, the series is monotonic
                    flush(x, y, minIndex, maxIndex, out);
                    minIndex = -1;
                    out.add(x[i], y[i]);
                    break;
                }
                continue;
            }
            if (!seenInside) {
                seenInside = true;
                if (lastOutsideBefore >= 0) {
                    out.add(x[lastOutsideBefore], y[lastOutsideBefore]);
                }
            }
            int c = Math.min(columns - 1, (int) ((x[i] - lo) * scale));
            if (c != column) {
                flush(x, y, minIndex, maxIndex, out);
                column = c;
                minIndex = i;
                maxIndex = i;
            } else if (y[i] < y[minIndex]) {
                minIndex = i;
            } else if (y[i] > y[maxIndex]) {
                maxIndex = i;
            }
        }
        flush(x, y, minIndex, maxIndex, out);
        return out.result();
    }

    private static void flush(double[] x, double[] y, int minIndex, int maxIndex, Out out) {
        if (minIndex < 0) {
            return;
        }
        int first = Math.min(minIndex, maxIndex);
        int second = Math.max(minIndex, maxIndex);
        out.add(x[first], y[first]);
        if (second != first) {
            out.add(x[second], y[second]);
        }
    }

    /** Growing output arrays. */
    private static final class Out {
        private double[] x;
        private double[] y;
        private int n;

        Out(int capacity) {
            x = new double[capacity];
            y = new double[capacity];
        }

        void add(double xv, double yv) {
            if (n == x.length) {
                x = Arrays.copyOf(x, 2 * n);
                y = Arrays.copyOf(y, 2 * n);
            }
            x[n] = xv;
            y[n++] = yv;
        }

        /** One NaN between kept points; none at the start or twice in a row. */
        void gap() {
            if (n > 0 && !Double.isNaN(y[n - 1])) {
                add(x[n - 1], Double.NaN);
            }
        }

        Decimated result() {
            return new Decimated(Arrays.copyOf(x, n), Arrays.copyOf(y, n));
        }
    }
}
