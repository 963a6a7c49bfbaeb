package org.tracegas.qa.control;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Arrays;

import org.junit.jupiter.api.Test;

class CusumChartTest {

    @Test
    void stepChangeDetectedAtTheRightSample() {
        // mu = 0, sigma = 1, k = 0.5, h = 4. Ten samples at 0, then a step to 2: S+ grows by 2 - 0.5 = 1.5
        // per sample, 1.5, 3.0, 4.5 > 4 -> signal at the third shifted sample, index 12 (hand-computed)
        double[] x = new double[20];
        for (int i = 10; i < 20; i++) {
            x[i] = 2.0;
        }
        CusumResult r = new CusumChart(0, 1, 0.5, 4).evaluate(x);
        assertEquals(12, r.firstSignal());
        assertEquals(4.5, r.upperSums()[12], 1e-12);
        assertEquals(0.0, r.lowerSums()[12], 0);
        assertEquals("CUSUM upward shift", r.signals().get(0).rule());
    }

    @Test
    void downwardShiftWithNoise() {
        // alternating ±0.25 noise stays below k = 0.5: no sums build up before the step of -1.5 at index 15
        double[] x = new double[30];
        for (int i = 0; i < 30; i++) {
            x[i] = (i % 2 == 0 ? 0.25 : -0.25) - (i >= 15 ? 1.5 : 0);
        }
        CusumResult r = new CusumChart(0, 1, 0.5, 4.5).evaluate(x);
        // hand-computed S-: 15: d = -1.75 -> 1.25; 16: -1.25 -> 2.0; 17: -1.75 -> 3.25; 18: -1.25 -> 4.0;
        // 19: -1.75 -> 5.25 > 4.5 -> signal at 19
        assertEquals(19, r.firstSignal());
        assertEquals(0.0, r.lowerSums()[14], 0);
        assertArrayEquals(new double[] {1.25, 2.0, 3.25, 4.0, 5.25},
                Arrays.copyOfRange(r.lowerSums(), 15, 20), 1e-12);
        assertEquals("CUSUM downward shift", r.signals().get(0).rule());
    }

    @Test
    void en14181DriftSums() {
        // EN 14181:2004 Annex C drift sums k = 0.501 s_AMS, h = 2.85 s_AMS (recalled, not confirmed): a drift of
        // 1 s_AMS per check adds 0.499 s_AMS per check: 5 x 0.499 = 2.495, 6 x 0.499 = 2.994 > 2.85 -> 6th check
        double sAms = 0.8;
        double[] x = new double[10];
        for (int i = 0; i < 10; i++) {
            x[i] = 50.0 + sAms;
        }
        CusumResult r = CusumChart.en14181Drift(50.0, sAms).evaluate(x);
        assertEquals(5, r.firstSignal());
        assertEquals(2.994 * sAms, r.upperSums()[5], 1e-12);
    }
}
