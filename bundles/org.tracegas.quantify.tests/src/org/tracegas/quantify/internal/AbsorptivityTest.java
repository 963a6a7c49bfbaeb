package org.tracegas.quantify.internal;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

class AbsorptivityTest {

    private static final double[] AXIS = {1000, 1001, 1002, 1003};

    private static Absorptivity threeReferences() {
        return new Absorptivity("X", new double[] {10, 20, 40}, new double[][] {AXIS, AXIS, AXIS},
                new double[][] {{1, 2, 3, 4}, {1.8, 3.6, 5.4, 7.2}, {3.2, 6.4, 9.6, 12.8}});
    }

    @Test
    void effectiveMixIsPiecewiseLinearBetweenBracketingReferences() {
        Absorptivity a = threeReferences();
        assertArrayEquals(new double[] {1, 0, 0}, a.effectiveMix(4), 0);
        assertArrayEquals(new double[] {0.5, 0.5, 0}, a.effectiveMix(15), 1e-15);
        assertArrayEquals(new double[] {0, 0.75, 0.25}, a.effectiveMix(25), 1e-15);
        assertArrayEquals(new double[] {0, 0, 1}, a.effectiveMix(90), 0);
        assertEquals(0.1, a.at(0, 0, 1000), 1e-15); // absorbance 1 at 10 ppm·m
        assertEquals(0.08, a.at(2, 0, 1000), 1e-15);
    }

    /** Pooled absorptivity = sum(a A) / sum(a^2): the least-squares slope through the origin. */
    @Test
    void pooledMixIsLeastSquaresThroughOrigin() {
        double[] mix = threeReferences().pooledMix();
        assertArrayEquals(new double[] {100 / 2100.0, 400 / 2100.0, 1600 / 2100.0}, mix, 1e-15);
    }

    @Test
    void refusesAmountsOutOfOrder() {
        assertThrows(IllegalArgumentException.class, () -> new Absorptivity("X", new double[] {20, 10},
                new double[][] {AXIS, AXIS}, new double[][] {{1, 2, 3, 4}, {1, 2, 3, 4}}));
    }
}
