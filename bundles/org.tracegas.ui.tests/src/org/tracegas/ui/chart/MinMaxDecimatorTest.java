package org.tracegas.ui.chart;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;

import org.junit.jupiter.api.Test;

// The expected values come from a brute-force scan of the same data, the definition of the min/max
// per column thinning (common practice in plotting, no source).
class MinMaxDecimatorTest {

    @Test
    void everyColumnKeepsItsLowestAndHighestPoint() {
        Random r = new Random(7);
        int n = 100_000;
        double[] x = new double[n];
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = i * 0.01;
            y[i] = Math.sin(i * 0.001) + 0.1 * r.nextGaussian() + (i == 54_321 ? 5 : 0);
        }
        int columns = 640;
        double from = 100;
        double to = 900;
        assertSameEnvelope(x, y, from, to, columns);
        MinMaxDecimator.Decimated d = MinMaxDecimator.decimate(x, y, from, to, columns);
        // the spike at index 54,321 (x = 543.21) survives
        double spike = y[54_321];
        assertTrue(java.util.Arrays.stream(d.y()).anyMatch(v -> v == spike));
    }

    /**
     * Zoom windows over a day of one-second values with spikes, gaps (NaN runs) and both axis directions: each
     * column's lowest and highest value, and the gaps, match a scan of every point (brute force, computed here).
     */
    @Test
    void noExtremeIsLostAtAnyZoom() {
        Random r = new Random(11);
        int n = 86_400;
        double[] hours = new double[n];
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            hours[i] = i / 3600.0;
            y[i] = 20 + 3 * Math.sin(i / 4000.0) + 0.4 * r.nextGaussian();
            if (r.nextDouble() < 1e-3) {
                y[i] += (r.nextBoolean() ? 1 : -1) * 50 * r.nextDouble();
            }
        }
        for (int g = 0; g < 30; g++) {
            int start = r.nextInt(n - 400);
            java.util.Arrays.fill(y, start, start + 1 + r.nextInt(300), Double.NaN);
        }
        double[] descending = new double[n];
        double[] yDescending = new double[n];
        for (int i = 0; i < n; i++) {
            descending[i] = hours[n - 1 - i];
            yDescending[i] = y[n - 1 - i];
        }
        for (int k = 0; k < 200; k++) {
            double a = r.nextDouble() * 24;
            double b = k % 4 == 0 ? a + r.nextDouble() * 0.01 : r.nextDouble() * 24;
            int columns = 1 + r.nextInt(2000);
            if (a == b) {
                continue;
            }
            assertSameEnvelope(hours, y, a, b, columns);
            assertSameEnvelope(descending, yDescending, a, b, columns);
        }
    }

    private static void assertSameEnvelope(double[] x, double[] y, double from, double to, int columns) {
        double lo = Math.min(from, to);
        double hi = Math.max(from, to);
        double scale = columns / (hi - lo);
        MinMaxDecimator.Decimated d = MinMaxDecimator.decimate(x, y, from, to, columns);
        double[] wantMin = new double[columns];
        double[] wantMax = new double[columns];
        double[] gotMin = new double[columns];
        double[] gotMax = new double[columns];
        java.util.Arrays.fill(wantMin, Double.POSITIVE_INFINITY);
        java.util.Arrays.fill(gotMin, Double.POSITIVE_INFINITY);
        java.util.Arrays.fill(wantMax, Double.NEGATIVE_INFINITY);
        java.util.Arrays.fill(gotMax, Double.NEGATIVE_INFINITY);
        int wantGaps = 0;
        boolean inGap = true;
        for (int i = 0; i < x.length; i++) {
            if (x[i] < lo || x[i] > hi) {
                continue;
            }
            if (Double.isNaN(y[i])) {
                wantGaps += inGap ? 0 : 1;
                inGap = true;
                continue;
            }
            inGap = false;
            int c = Math.min(columns - 1, (int) ((x[i] - lo) * scale));
            wantMin[c] = Math.min(wantMin[c], y[i]);
            wantMax[c] = Math.max(wantMax[c], y[i]);
        }
        int gotGaps = 0;
        for (int i = 0; i < d.size(); i++) {
            if (Double.isNaN(d.y()[i])) {
                gotGaps++;
            } else if (d.x()[i] >= lo && d.x()[i] <= hi) {
                int c = Math.min(columns - 1, (int) ((d.x()[i] - lo) * scale));
                gotMin[c] = Math.min(gotMin[c], d.y()[i]);
                gotMax[c] = Math.max(gotMax[c], d.y()[i]);
            }
            if (i > 0) {
                double step = d.x()[i] - d.x()[i - 1];
                assertTrue(x[0] <= x[x.length - 1] ? step >= 0 : step <= 0, "kept points out of order at " + i);
            }
        }
        String where = from + " to " + to + " in " + columns + " columns";
        assertArrayEquals(wantMin, gotMin, where);
        assertArrayEquals(wantMax, gotMax, where);
        // a gap before the visible points may show as one more, after the neighbour kept outside
        assertTrue(gotGaps == wantGaps || gotGaps == wantGaps + 1, where + ": gaps " + gotGaps + ", want " + wantGaps);
        // two per column, the two neighbours outside; a gap adds itself and splits a column in two
        assertTrue(d.size() <= 2 * columns + 2 + 3 * gotGaps, where + ": points kept " + d.size());
    }

    @Test
    void aZoomBetweenTwoValuesKeepsTheLineThroughIt() {
        double[] x = {0, 1, 2, 3};
        double[] y = {4, 6, 8, 10};
        MinMaxDecimator.Decimated d = MinMaxDecimator.decimate(x, y, 1.25, 1.75, 300);
        assertArrayEquals(new double[] {1, 2}, d.x());
        assertArrayEquals(new double[] {6, 8}, d.y());
    }

    @Test
    void pointsStayInOrderAndNeighboursOutsideTheRangeAreKept() {
        double[] x = {0, 1, 2, 3, 4, 5, 6, 7, 8, 9};
        double[] y = {0, 5, 1, 4, 2, 3, 9, 8, 7, 6};
        MinMaxDecimator.Decimated d = MinMaxDecimator.decimate(x, y, 2, 7, 2);
        // columns: [2, 4.5) holds x 2, 3, 4 -> min 1 at 2, max 4 at 3; [4.5, 7] holds 5, 6, 7 -> min 3 at 5, max 9 at 6
        assertArrayEquals(new double[] {1, 2, 3, 5, 6, 8}, d.x());
        assertArrayEquals(new double[] {5, 1, 4, 3, 9, 7}, d.y());
    }

    @Test
    void descendingAxisAndNaNGapsAreHandled() {
        double[] x = {10, 9, 8, 7, 6, 5};
        double[] y = {1, Double.NaN, 3, 2, Double.NaN, Double.NaN};
        MinMaxDecimator.Decimated d = MinMaxDecimator.decimate(x, y, 5, 10, 100);
        // the NaN at 9 becomes one gap point; the trailing NaN run one more
        assertArrayEquals(new double[] {10, 10, 8, 7, 7}, d.x());
        assertArrayEquals(new double[] {1, Double.NaN, 3, 2, Double.NaN}, d.y());
    }

    @Test
    void wrongArgumentsAreNamed() {
        double[] x = {1, 2};
        IllegalArgumentException a = assertThrows(IllegalArgumentException.class,
                () -> MinMaxDecimator.decimate(x, new double[] {1}, 1, 2, 10));
        assertTrue(a.getMessage().startsWith("y has 1 points"), a.getMessage());
        IllegalArgumentException b = assertThrows(IllegalArgumentException.class,
                () -> MinMaxDecimator.decimate(x, x, 1, 2, 0));
        assertEquals("columns must be at least 1, was 0", b.getMessage());
        IllegalArgumentException c = assertThrows(IllegalArgumentException.class,
                () -> MinMaxDecimator.decimate(x, x, 2, 2, 10));
        assertTrue(c.getMessage().startsWith("visible range"), c.getMessage());
    }
}
