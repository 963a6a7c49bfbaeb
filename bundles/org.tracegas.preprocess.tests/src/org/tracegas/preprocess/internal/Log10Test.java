package org.tracegas.preprocess.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;

class Log10Test {

    @Test
    void agreesWithStrictMathOverTheWholeRange() {
        // java.lang.StrictMath.log10 (fdlibm, within 1 ulp of the exact value) as the reference
        SplittableRandom random = new SplittableRandom(7);
        double worst = 0;
        for (int i = 0; i < 1_000_000; i++) {
            double x = Math.pow(10, random.nextDouble(-300, 300));
            worst = Math.max(worst, Math.abs(Log10.of(x) - StrictMath.log10(x)) / Math.max(1, Math.abs(StrictMath.log10(x))));
        }
        assertTrue(worst < 1e-15, "worst error " + worst);
    }

    @Test
    void accurateForTransmittancesNearOne() {
        // small absorbances: absolute error matters, StrictMath as the reference
        SplittableRandom random = new SplittableRandom(11);
        for (int i = 0; i < 200_000; i++) {
            double t = 1.0 + random.nextDouble(-0.05, 0.05);
            assertEquals(StrictMath.log10(t), Log10.of(t), 1e-16, "t = " + t);
        }
        assertEquals(0.0, Log10.of(1.0), 0.0);
        assertEquals(-1.0, Log10.of(0.1), 4e-16); // about 1 ulp
        assertEquals(3.0, Log10.of(1000.0), 1e-15);
    }

    @Test
    void specialValues() {
        assertTrue(Double.isNaN(Log10.of(0.0)));
        assertTrue(Double.isNaN(Log10.of(-1.0)));
        assertTrue(Double.isNaN(Log10.of(Double.NaN)));
        assertEquals(Double.POSITIVE_INFINITY, Log10.of(Double.POSITIVE_INFINITY));
        assertEquals(StrictMath.log10(Double.MIN_VALUE), Log10.of(Double.MIN_VALUE), 0.0);
    }
}
