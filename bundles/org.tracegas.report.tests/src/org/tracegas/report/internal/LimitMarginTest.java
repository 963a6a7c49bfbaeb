package org.tracegas.report.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class LimitMarginTest {

    @Test
    void twoSidedRelativeToTheHalfWidth() {
        // |0.06 - 0| / 0.12 - 1 = -0.5; |-0.18| / 0.12 - 1 = 0.5; |9.5 - 10| / 1 - 1 = -0.5 (hand-computed)
        assertEquals(-0.5, LimitMargin.of("0.06 ppm", "-0.12 .. 0.12 ppm").getAsDouble(), 1e-12);
        assertEquals(0.5, LimitMargin.of("-0.18 ppm", "-0.12 .. 0.12 ppm").getAsDouble(), 1e-12);
        assertEquals(-0.5, LimitMargin.of("9.5 m", "9 .. 11 m").getAsDouble(), 1e-12);
        assertEquals(0.0, LimitMargin.of("0.12 ppm", "-0.12 .. 0.12 ppm").getAsDouble(), 1e-12);
    }

    @Test
    void oneSidedRelativeToTheBound() {
        // (1 - 5) / 5 = -0.8; (30 - 24) / 24 = 0.25; (70 - 63) / 70 = 0.1; a bound of 0 in units (hand-computed)
        assertEquals(-0.8, LimitMargin.of("1 %", "<= 5 %").getAsDouble(), 1e-12);
        assertEquals(0.25, LimitMargin.of("30 h", "<= 24 h").getAsDouble(), 1e-12);
        assertEquals(0.1, LimitMargin.of("63 %", ">= 70 %").getAsDouble(), 1e-12);
        assertEquals(2.0, LimitMargin.of("2 signals", "<= 0 signals").getAsDouble(), 1e-12);
        assertEquals(-0.5, LimitMargin.of("0.5", "<= 1").getAsDouble(), 1e-12);
    }

    @Test
    void textsNotInTheWrittenFormGiveNoMargin() {
        assertTrue(LimitMargin.of("n/a", "<= 5 %").isEmpty());
        assertTrue(LimitMargin.of("1 %", "<= 5 ppm").isEmpty(), "units differ");
        assertTrue(LimitMargin.of("1 %", "any %").isEmpty());
        assertTrue(LimitMargin.of("1 %", "5 .. 1 %").isEmpty(), "reversed limits");
        assertTrue(LimitMargin.of("1 %", "see plan").isEmpty());
    }
}
