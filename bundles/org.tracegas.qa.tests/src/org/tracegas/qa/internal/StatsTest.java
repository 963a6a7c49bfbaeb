package org.tracegas.qa.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class StatsTest {

    // 2, 4, 4, 4, 5, 5, 7, 9: mean 5, sum of squared deviations 32 (a textbook example, hand-computed)
    private static final double[] X = {2, 4, 4, 4, 5, 5, 7, 9};

    @Test
    void meanAndDeviations() {
        assertEquals(5.0, Stats.mean(X), 0);
        assertEquals(2.0, Stats.rmsDeviation(X), 1e-15); // sqrt(32/8)
        assertEquals(Math.sqrt(32.0 / 7), Stats.sampleStandardDeviation(X), 1e-15);
    }

    @Test
    void namesTheBadValue() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> Stats.mean(new double[] {1, Double.NaN}));
        assertTrue(e.getMessage().contains("value 1"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> Stats.sampleStandardDeviation(new double[] {1}));
    }
}
