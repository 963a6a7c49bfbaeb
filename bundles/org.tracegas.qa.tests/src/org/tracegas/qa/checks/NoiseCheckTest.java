package org.tracegas.qa.checks;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class NoiseCheckTest {

    @Test
    void rmsOfASineIsAmplitudeOverRootTwo() {
        // over whole periods the RMS of a·sin is a/√2 (analytic), offsets do not count
        int n = 4000;
        double[] x = new double[n];
        double[] a = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = 2000 + i * 0.5; // 2000 .. 3999.5 cm-1
            a[i] = 0.01 + 1e-3 * Math.sin(2 * Math.PI * i / 40.0);
        }
        // points 400..1599 inside the region: 1200 points = 30 whole periods
        NoiseCheck check = new NoiseCheck(new AbsorbanceRegion(2200, 2799.5), 1e-3);
        assertEquals(1e-3 / Math.sqrt(2), check.rmsNoise(x, a), 1e-12);
        assertTrue(check.evaluate(x, a).passed());
        assertFalse(new NoiseCheck(new AbsorbanceRegion(2200, 2799.5), 5e-4).evaluate(x, a).passed());
    }

    @Test
    void regionWithoutPointsIsAnError() {
        NoiseCheck check = new NoiseCheck(new AbsorbanceRegion(100, 200), 1e-3);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> check.rmsNoise(new double[] {1000, 1001}, new double[] {0, 0}));
        assertTrue(e.getMessage().contains("holds 0 points"), e.getMessage());
    }
}
