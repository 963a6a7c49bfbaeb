package org.tracegas.qa.checks;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class CtsDriftCheckTest {

    private final CtsDriftCheck check = new CtsDriftCheck(CtsDriftCheck.METHOD_320_TOLERANCE_PERCENT);

    @Test
    void withinFivePercentOfTheMean() {
        // EPA Method 320 section 8.11.3 (not confirmed): pre/post CTS within ±5 % of their mean.
        // 1.00 and 0.92: mean 0.96, each 0.04 away = 4.167 % (hand-computed)
        CheckOutcome o = check.evaluate(1.00, 0.92);
        assertEquals(4.1667, o.measured(), 1e-4);
        assertTrue(o.passed());
        assertTrue(o.rule().source().contains("8.11.3"));
    }

    @Test
    void failsBeyondFivePercent() {
        CheckOutcome o = check.evaluate(1.00, 0.88); // 0.06/0.94 = 6.38 %
        assertEquals(6.383, o.measured(), 1e-3);
        assertFalse(o.passed());
    }
}
