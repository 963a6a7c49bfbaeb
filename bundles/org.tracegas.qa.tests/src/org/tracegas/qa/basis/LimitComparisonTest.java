package org.tracegas.qa.basis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.time.Duration;
import java.time.Instant;
import java.util.List;

import org.junit.jupiter.api.Test;

class LimitComparisonTest {

    private static final Instant D0 = Instant.parse("2026-03-02T00:00:00Z");
    private static final EmissionLimit SO2_DAILY = new EmissionLimit("SO2", 50, "mg/m³ dry, 10 % O2",
            Duration.ofDays(1));

    private static PeriodAverage day(int n, double mean, boolean valid) {
        Instant s = D0.plus(Duration.ofDays(n));
        return new PeriodAverage(s, s.plus(Duration.ofDays(1)), mean, valid ? 48 : 20, 0, 0, 48, valid, 0, 0);
    }

    @Test
    void plainComparison() {
        List<Exceedance> e = new LimitComparison(0).exceedances(SO2_DAILY,
                List.of(day(0, 49.9, true), day(1, 50.1, true), day(2, 80, false)));
        assertEquals(1, e.size()); // invalid days are not judged
        assertEquals(50.1, e.get(0).average().mean(), 0);
    }

    @Test
    void confidenceIntervalIsSubtractedFirst() {
        // EU IED Annex VI Part 8 section 1.2: averages after subtracting the confidence interval; SO2 interval
        // 20 % of the daily ELV (Part 6 section 1.3). 55 -> 45 (no exceedance), 62 -> 52 (exceedance), hand-computed
        List<Exceedance> e = new LimitComparison(20).exceedances(SO2_DAILY,
                List.of(day(0, 55, true), day(1, 62, true)));
        assertEquals(1, e.size());
        assertEquals(52.0, e.get(0).validatedValue(), 1e-12);
    }

    @Test
    void aPeriodShortOfDataIsNotAssessedEvenBelowTheLimit() {
        // a value from a period that fails its availability rule says nothing about compliance: IED 2010/75/EU
        // Annex VI Part 8 point 1.2 discards such days; reporting them "within limit" would claim what was not shown
        LimitComparison plain = new LimitComparison(0);
        assertEquals(LimitStatus.NOT_ASSESSED, plain.status(SO2_DAILY, day(0, 10, false)));
        assertEquals(LimitStatus.NOT_ASSESSED, plain.status(SO2_DAILY, day(0, 80, false)));
        assertEquals(LimitStatus.WITHIN, plain.status(SO2_DAILY, day(0, 49.9, true)));
        assertEquals(LimitStatus.EXCEEDED, plain.status(SO2_DAILY, day(0, 50.1, true)));
        assertEquals(LimitStatus.NO_LIMIT, plain.status(null, day(0, 80, true)));
    }

    @Test
    void rejectsAveragesOfAnotherPeriod() {
        PeriodAverage halfHour = new PeriodAverage(D0, D0.plus(Duration.ofMinutes(30)), 60, 30, 0, 0, 30, true, 0, 0);
        assertThrows(IllegalArgumentException.class,
                () -> new LimitComparison(0).exceedances(SO2_DAILY, List.of(halfHour)));
    }
}
