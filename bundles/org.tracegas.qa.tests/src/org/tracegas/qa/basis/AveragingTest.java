package org.tracegas.qa.basis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Duration;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;

class AveragingTest {

    private static final Instant T0 = Instant.parse("2026-03-02T10:00:00Z");
    private final Averaging halfHour = new Averaging(Duration.ofMinutes(30), Duration.ofMinutes(1),
            Averaging.COMMON_PRACTICE_MINIMUM_FRACTION, ZoneOffset.UTC);

    @Test
    void alignsToPeriodStarts() {
        assertEquals(T0, halfHour.periodStart(Instant.parse("2026-03-02T10:07:31Z")));
        assertEquals(T0.plus(Duration.ofMinutes(30)), halfHour.periodStart(Instant.parse("2026-03-02T10:30:00Z")));
        Averaging daily = new Averaging(Duration.ofDays(1), Duration.ofMinutes(30), 0.75, ZoneOffset.ofHours(1));
        // midnight at UTC+01:00 is 23:00 UTC of the day before
        assertEquals(Instant.parse("2026-03-01T23:00:00Z"), daily.periodStart(Instant.parse("2026-03-02T22:59:00Z")));
        assertEquals(Instant.parse("2026-03-02T23:00:00Z"), daily.periodStart(Instant.parse("2026-03-02T23:00:00Z")));
    }

    @Test
    void meansAndMinimumDataRule() {
        List<TimedValue> values = new ArrayList<>();
        for (int m = 0; m < 30; m++) { // full first half hour: values 0..29, mean 14.5
            values.add(new TimedValue(T0.plus(Duration.ofMinutes(m)), m));
        }
        for (int m = 30; m < 53; m++) { // 23 of 30 values (76.7 %): valid; constant 8
            values.add(new TimedValue(T0.plus(Duration.ofMinutes(m)), 8));
        }
        for (int m = 60; m < 82; m++) { // 22 of 30 values (73.3 %): invalid
            values.add(new TimedValue(T0.plus(Duration.ofMinutes(m)), 5));
        }
        List<PeriodAverage> a = halfHour.average(values);
        assertEquals(3, a.size());
        assertEquals(14.5, a.get(0).mean(), 1e-12);
        assertTrue(a.get(0).valid());
        assertEquals(100.0, a.get(0).capturePercent(), 1e-12);
        assertEquals(8.0, a.get(1).mean(), 1e-12);
        assertEquals(23, a.get(1).count());
        assertTrue(a.get(1).valid());
        assertFalse(a.get(2).valid());
        assertEquals(T0.plus(Duration.ofMinutes(90)), a.get(2).end());
    }

    @Test
    void ruleNamesItsSource() {
        assertTrue(halfHour.validityRule().source().contains("common practice"));
        assertTrue(halfHour.validityRule().statement().contains("30-minute"), halfHour.validityRule().statement());
    }

    @Test
    void rejectsTooManyValuesInAPeriod() {
        List<TimedValue> values = new ArrayList<>();
        for (int s = 0; s < 31; s++) {
            values.add(new TimedValue(T0.plusSeconds(s * 50L), 1));
        }
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> halfHour.average(values));
        assertTrue(e.getMessage().contains("31 values"), e.getMessage());
    }

    @Test
    void rejectsLengthNotAWholeNumberOfIntervals() {
        assertThrows(IllegalArgumentException.class,
                () -> new Averaging(Duration.ofMinutes(30), Duration.ofMinutes(7), 0.75, ZoneOffset.UTC));
    }
}
