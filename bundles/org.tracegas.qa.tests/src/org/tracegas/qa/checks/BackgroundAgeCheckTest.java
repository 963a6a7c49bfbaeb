package org.tracegas.qa.checks;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Duration;
import java.time.Instant;

import org.junit.jupiter.api.Test;

class BackgroundAgeCheckTest {

    private static final Instant BG = Instant.parse("2026-03-02T08:00:00Z");
    private final BackgroundAgeCheck check = new BackgroundAgeCheck(Duration.ofHours(4));

    @Test
    void ageInHours() {
        CheckOutcome o = check.evaluate(BG, BG.plus(Duration.ofMinutes(150)));
        assertEquals(2.5, o.measured(), 1e-12);
        assertTrue(o.passed());
        assertFalse(check.evaluate(BG, BG.plus(Duration.ofMinutes(241))).passed());
    }

    @Test
    void measurementBeforeBackgroundIsAnError() {
        assertThrows(IllegalArgumentException.class, () -> check.evaluate(BG, BG.minusSeconds(1)));
    }
}
