package org.tracegas.report.internal;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.tracegas.qa.checks.CtsDriftCheck;
import org.tracegas.qa.checks.ZeroSpanCheck;
import org.tracegas.report.QaLine;

class QaTablesTest {

    private static final String ZERO_SOURCE = "limits: test plan or the QAL1 figures of the instrument; EN 14181 "
            + "section 7 checks zero and span against QAL1";

    private final QaTables tables = new QaTables(List.of(
            QaLine.of(new ZeroSpanCheck(1.0, 2.0).zero("CO", 0.2)),
            QaLine.of(new ZeroSpanCheck(1.0, 2.0).zero("CO", 1.3)),
            QaLine.of(new ZeroSpanCheck(1.0, 2.0).zero("CO", -0.6)),
            QaLine.of(new CtsDriftCheck(5).evaluate(1.00, 0.99)),
            QaLine.of(new ZeroSpanCheck(0.5, 2.0).zero("NO", 0.1)),
            QaLine.of(new ZeroSpanCheck(0.2, 2.0).zero("NO", -0.15))));

    @Test
    void summaryRowPerCheckThenItsFailedReadings() {
        List<String[]> rows = tables.summaryRows();
        assertEquals(4, rows.size());
        // 1.3 ppm is outside ±1 ppm and the furthest out (hand-computed)
        assertArrayEquals(new String[] {"Zero CO", "FAIL", "3, 1 fail", "worst 1.3 ppm", "-1 .. 1 ppm",
            "Zero reading within ±1 ppm of 0 [Source: " + ZERO_SOURCE + "]"}, rows.get(0));
        assertArrayEquals(new String[] {"Zero CO", "FAIL", "no. 2 of 3", "1.3 ppm", "-1 .. 1 ppm", ""}, rows.get(1));
        // 1.00 and 0.99 each 0.005 from their mean 0.995: 0.5025 %; a single check as it is (hand-computed)
        assertEquals("CTS drift", rows.get(2)[0]);
        assertEquals("1", rows.get(2)[2]);
        assertEquals("0.5025 %", rows.get(2)[3]);
        // -0.15 of ±0.2 (margin -0.25) is worse than 0.1 of ±0.5 (margin -0.8); limits and rules differ
        assertArrayEquals(new String[] {"Zero NO", "pass", "2, all pass", "worst -0.15 ppm", "-0.2 .. 0.2 ppm",
            "Rule of the worst reading: Zero reading within ±0.2 ppm of 0 [Source: " + ZERO_SOURCE + "] The rule "
                    + "differs between readings; each reading's limits are in Appendix A."}, rows.get(3));
    }

    @Test
    void overviewCountsAndNamesTheFailures() {
        assertEquals("6 readings of 3 checks: 5 passed, 1 failed. Failed: Zero CO (1 of 3). One row per check; for "
                + "a repeated check the reading closest to or furthest beyond its limits is shown as the worst, and "
                + "each failed reading follows in its own row. Every reading is listed in Appendix A.",
                tables.overview());
    }

    @Test
    void appendixHasEveryReadingNumberedWithinItsCheck() {
        List<String[]> rows = tables.appendixRows();
        assertEquals(6, rows.size());
        assertTrue(tables.needsAppendix());
        assertArrayEquals(new String[] {"Zero CO", "3 of 3", "pass", "-0.6 ppm", "-1 .. 1 ppm"}, rows.get(2));
        assertArrayEquals(new String[] {"CTS drift", "1 of 1", "pass", "0.5025 %", "<= 5 %"}, rows.get(3));
        assertArrayEquals(new String[] {"Zero NO", "2 of 2", "pass", "-0.15 ppm", "-0.2 .. 0.2 ppm"}, rows.get(5));
    }

    @Test
    void singleChecksNeedNoAppendix() {
        QaTables single = new QaTables(List.of(QaLine.of(new CtsDriftCheck(5).evaluate(1.00, 0.88))));
        assertFalse(single.needsAppendix());
        assertEquals("1 reading of 1 check: 0 passed, 1 failed. Failed: CTS drift.", single.overview());
    }
}
