package org.tracegas.qa.checks;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import org.junit.jupiter.api.Test;

class CheckOutcomeTest {

    private static final Rule RULE = new Rule("at most 5", "common practice, no source");

    @Test
    void notFiniteMeasurementFails() {
        assertFalse(CheckOutcome.judge("x", Double.NaN, "%", AcceptanceLimits.atMost(5), RULE).passed());
    }

    @Test
    void summaryLine() {
        assertEquals("CTS drift: 6.383 % (limits <= 5) FAIL",
                CheckOutcome.judge("CTS drift", 6.382978723, "%", AcceptanceLimits.atMost(5), RULE).summary());
    }
}
