package org.tracegas.quantify.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class ResamplerTest {

    @Test
    void interpolatesLinearlyOnDescendingAxes() {
        Resampler r = new Resampler(new double[] {3, 2, 0}, new double[] {30, 20, 0});
        assertEquals(25, r.at(2.5), 1e-15);
        assertEquals(5, r.at(0.5), 1e-15);
        assertEquals(20, r.at(2), 0);
        assertEquals(30, r.at(7), 0); // nearest end outside
        assertTrue(r.covers(0) && r.covers(3));
        assertFalse(r.covers(3.0001));
    }

    /** Three-point derivatives on an uneven axis are exact for a parabola (Lagrange interpolation). */
    @Test
    void threePointDerivativesExactForParabola() {
        double[] x = {0, 0.5, 1.5, 1.75, 3};
        double[] y = new double[x.length];
        for (int i = 0; i < x.length; i++) {
            y[i] = 2 - x[i] + 0.5 * x[i] * x[i];
        }
        double[] d1 = Resampler.derivative(x, y, 1);
        double[] d2 = Resampler.derivative(x, y, 2);
        for (int i = 0; i < x.length; i++) {
            assertEquals(-1 + x[i], d1[i], 1e-13);
            assertEquals(1, d2[i], 1e-13);
        }
    }
}
