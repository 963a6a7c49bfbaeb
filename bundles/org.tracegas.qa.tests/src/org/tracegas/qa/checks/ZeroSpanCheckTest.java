package org.tracegas.qa.checks;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class ZeroSpanCheckTest {

    private final ZeroSpanCheck check = new ZeroSpanCheck(0.5, 2.0);

    @Test
    void zeroWithinAbsoluteLimit() {
        assertTrue(check.zero("CO", -0.4).passed());
        assertFalse(check.zero("CO", 0.6).passed());
    }

    @Test
    void spanDriftInPercent() {
        // (81.2 - 80) / 80 = 1.5 % (hand-computed)
        CheckOutcome o = check.span("CO", 81.2, 80.0);
        assertEquals(1.5, o.measured(), 1e-12);
        assertTrue(o.passed());
        assertFalse(check.span("CO", 78.0, 80.0).passed()); // -2.5 %
        assertTrue(o.summary().contains("Span CO") && o.summary().contains("pass"), o.summary());
    }
}
