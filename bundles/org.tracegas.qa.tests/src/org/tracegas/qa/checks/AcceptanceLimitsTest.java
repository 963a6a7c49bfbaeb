package org.tracegas.qa.checks;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class AcceptanceLimitsTest {

    @Test
    void closedInterval() {
        AcceptanceLimits l = new AcceptanceLimits(70, 130);
        assertTrue(l.contains(70) && l.contains(130));
        assertFalse(l.contains(130.0001));
        assertEquals("70 .. 130", l.describe());
        assertEquals("<= 5", AcceptanceLimits.atMost(5).describe());
        assertEquals("9.5 .. 10.5", AcceptanceLimits.relative(10, 5).describe());
    }

    @Test
    void rejectsReversedBounds() {
        assertThrows(IllegalArgumentException.class, () -> new AcceptanceLimits(2, 1));
    }
}
