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
        boolean ascending = x.length < 2 || x[0] <= x[x.length - 1];
        // the visible points are one index range of a monotonic series: found by bisection, not by a scan
        int first = ascending ? firstIndex(x, lo, true) : firstIndex(x, hi, false);
        int end = ascending ? firstIndex(x, Math.nextUp(hi), true) : firstIndex(x, Math.nextDown(lo), false);
        Out out = new Out(2 * columns + 4);
        int before = first - 1;
        while (before >= 0 && Double.isNaN(y[before])) {
            before--;
        }
        if (before >= 0) {
            out.add(x[before], y[before]);
        }
        int runStart = first;
        while (runStart < end) {
            int runEnd = columnEnd(x, runStart, end, lo, scale, columns);
            envelope(x, y, runStart, runEnd, out);
            runStart = runEnd;
        }
        int after = end;
        while (after < x.length && Double.isNaN(y[after])) {
            after++;
        }
        if (after < x.length) {
            out.add(x[after], y[after]);
        }
        return out.result();
    }

    /**
     * First index from which on the series has passed {@code limit}: x[i] &ge; limit when ascending, x[i] &le;
     * limit when descending; x.length when it never does.
     */
    private static int firstIndex(double[] x, double limit, boolean ascending) {
        int lo = 0;
        int hi = x.length;
        while (lo < hi) {
            int mid = (lo + hi) >>> 1;
            if (ascending ? x[mid] >= limit : x[mid] <= limit) {
                hi = mid;
            } else {
                lo = mid + 1;
            }
        }
        return lo;
    }

    /**
     * End (exclusive) of the run of visible points from {@code start} on that fall into start's column: found by
     * steps doubling from start, then bisection, so the search stays near the run (about two columns' worth of
     * steps), whatever the number of points.
     */
    private static int columnEnd(double[] x, int start, int end, double lo, double scale, int columns) {
        int column = column(x[start], lo, scale, columns);
        int inside = start;
        int bound = start + 1;
        int step = 1;
        while (bound < end && column(x[bound], lo, scale, columns) == column) {
            inside = bound;
            step <<= 1;
            bound = (int) Math.min(end, (long) start + step);
        }
        int a = inside + 1;
        int b = bound;
        while (a < b) {
            int mid = (a + b) >>> 1;
            if (column(x[mid], lo, scale, columns) != column) {
                b = mid;
            } else {
                a = mid + 1;
            }
        }
        return a;
    }

    private static int column(double x, double lo, double scale, int columns) {
        return Math.min(columns - 1, (int) ((x - lo) * scale));
    }

    /**
     * The lowest and the highest point of one column's points, in their order; only the y values are read,
     * once. A NaN ends what came before it and leaves a gap.
     */
    private static void envelope(double[] x, double[] y, int start, int end, Out out) {
        int minIndex = -1;
        int maxIndex = -1;
        double min = Double.POSITIVE_INFINITY;
        double max = Double.NEGATIVE_INFINITY;
        for (int i = start; i < end; i++) {
            double v = y[i];
            // the extremes stay in registers; a NaN fails both comparisons and is caught after them
            if (v < min) {
                min = v;
                minIndex = i;
            }
            if (v > max) {
                max = v;
                maxIndex = i;
            } else if (v != v) {
                flush(x, y, minIndex, maxIndex, out);
                minIndex = -1;
                maxIndex = -1;
                min = Double.POSITIVE_INFINITY;
                max = Double.NEGATIVE_INFINITY;
                out.gap();
            }
        }
        flush(x, y, minIndex, maxIndex, out);
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
