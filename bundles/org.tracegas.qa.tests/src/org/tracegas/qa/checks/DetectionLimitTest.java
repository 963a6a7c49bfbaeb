package org.tracegas.qa.checks;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class DetectionLimitTest {

    @Test
    void threeSigmaOfZeroReadings() {
        // readings 0.1, -0.1, 0.2, -0.2, 0: s = sqrt(0.1/4) = 0.158114; DL = 0.474342 ppm (hand-computed)
        DetectionLimit dl = DetectionLimit.fromZeroReadings("NH3", new double[] {0.1, -0.1, 0.2, -0.2, 0});
        assertEquals(0.474342, dl.ppm(), 1e-6);
        assertTrue(dl.check(0.5).passed());
        assertFalse(dl.check(0.4).passed());
    }

    @Test
    void threeSigmaOfNoise() {
        // 3 x 2e-4 / 1.5e-3 per ppm = 0.4 ppm (hand-computed)
        assertEquals(0.4, DetectionLimit.fromNoise("HCl", 2e-4, 1.5e-3).ppm(), 1e-12);
    }
}
