package org.tracegas.report.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.tracegas.qa.checks.CtsDriftCheck;
import org.tracegas.qa.checks.ZeroSpanCheck;
import org.tracegas.report.QaLine;

class QaGroupTest {

    private static final ZeroSpanCheck ZERO = new ZeroSpanCheck(1.0, 2.0);

    @Test
    void groupsByNameInTheOrderOfFirstReading() {
        QaLine co1 = QaLine.of(ZERO.zero("CO", 0.2));
        QaLine no1 = QaLine.of(ZERO.zero("NO", 0.1));
        QaLine co2 = QaLine.of(ZERO.zero("CO", -1.4));
        QaLine drift = QaLine.of(new CtsDriftCheck(5).evaluate(1.00, 0.88));
        List<QaGroup> g = QaGroup.of(List.of(co1, no1, co2, drift));
        assertEquals(List.of("Zero CO", "Zero NO", "CTS drift"), g.stream().map(QaGroup::check).toList());
        assertEquals(List.of(co1, co2), g.get(0).readings());
        assertTrue(g.get(0).repeated());
        assertFalse(g.get(1).repeated());
        // -1.4 ppm lies outside ±1 ppm (hand-computed)
        assertEquals(List.of(2), g.get(0).failedNumbers());
        assertEquals(List.of(1), g.get(2).failedNumbers());
    }

    @Test
    void worstIsTheReadingNearestToOrFurthestBeyondItsOwnLimits() {
        // 0.5 of ±1 (margin -0.5) against 0.3 of ±0.4 (margin -0.25): the second is worse (hand-computed)
        QaLine wide = QaLine.of(new ZeroSpanCheck(1.0, 2.0).zero("CO", 0.5));
        QaLine narrow = QaLine.of(new ZeroSpanCheck(0.4, 2.0).zero("CO", 0.3));
        QaLine first = QaLine.of(new ZeroSpanCheck(1.0, 2.0).zero("CO", -0.1));
        QaGroup g = QaGroup.of(List.of(first, wide, narrow)).get(0);
        assertSame(narrow, g.worst().orElseThrow());
        assertFalse(g.oneRule());
        assertFalse(g.oneLimits());
        QaGroup same = QaGroup.of(List.of(first, wide)).get(0);
        assertSame(wide, same.worst().orElseThrow());
        assertTrue(same.oneRule());
        assertTrue(same.oneLimits());
    }

    @Test
    void noWorstWhenAReadingIsNotANumber() {
        QaLine text = new QaLine("Visual check", true, "clean", "clean", "Window is clean", "common practice, no source");
        QaLine other = new QaLine("Visual check", true, "clean", "clean", "Window is clean", "common practice, no source");
        assertTrue(QaGroup.of(List.of(text, other)).get(0).worst().isEmpty());
    }

    @Test
    void readingsMustShareTheName() {
        QaLine co = QaLine.of(ZERO.zero("CO", 0.2));
        QaLine no = QaLine.of(ZERO.zero("NO", 0.2));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new QaGroup("Zero CO", List.of(co, no)));
        assertEquals("readings entry 1 is of check Zero NO, not Zero CO", e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> new QaGroup("Zero CO", List.of()));
    }
}
