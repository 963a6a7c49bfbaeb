package org.tracegas.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import org.junit.jupiter.api.Test;
import org.tracegas.qa.checks.CtsDriftCheck;

class QaLineTest {

    @Test
    void fromCheckOutcome() {
        // 1.00 and 0.88: 0.06/0.94 = 6.383 % (hand-computed)
        QaLine l = QaLine.of(new CtsDriftCheck(5).evaluate(1.00, 0.88));
        assertFalse(l.passed());
        assertEquals("6.383 %", l.measured());
        assertEquals("<= 5 %", l.limits());
        assertEquals("CTS drift", l.check());
    }
}
