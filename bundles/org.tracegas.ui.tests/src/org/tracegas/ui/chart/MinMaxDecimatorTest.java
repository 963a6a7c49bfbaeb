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
        MinMaxDecimator.Decimated d = MinMaxDecimator.decimate(x, y, from, to, columns);
        assertTrue(d.size() <= 2 * columns + 2, "points kept: " + d.size());
        double[] wantMin = new double[columns];
        double[] wantMax = new double[columns];
        double[] gotMin = new double[columns];
        double[] gotMax = new double[columns];
        java.util.Arrays.fill(wantMin, Double.POSITIVE_INFINITY);
        java.util.Arrays.fill(gotMin, Double.POSITIVE_INFINITY);
        java.util.Arrays.fill(wantMax, Double.NEGATIVE_INFINITY);
        java.util.Arrays.fill(gotMax, Double.NEGATIVE_INFINITY);
        for (int i = 0; i < n; i++) {
            if (x[i] >= from && x[i] <= to) {
                int c = Math.min(columns - 1, (int) ((x[i] - from) * columns / (to - from)));
                wantMin[c] = Math.min(wantMin[c], y[i]);
                wantMax[c] = Math.max(wantMax[c], y[i]);
            }
        }
        for (int i = 0; i < d.size(); i++) {
            if (d.x()[i] >= from && d.x()[i] <= to) {
                int c = Math.min(columns - 1, (int) ((d.x()[i] - from) * columns / (to - from)));
                gotMin[c] = Math.min(gotMin[c], d.y()[i]);
                gotMax[c] = Math.max(gotMax[c], d.y()[i]);
            }
        }
        assertArrayEquals(wantMin, gotMin);
        assertArrayEquals(wantMax, gotMax);
        // the spike at index 54,321 (x = 543.21) survives
        double spike = y[54_321];
        assertTrue(java.util.Arrays.stream(d.y()).anyMatch(v -> v == spike));
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
