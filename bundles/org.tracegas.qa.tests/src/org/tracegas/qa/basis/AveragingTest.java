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
    void excludedValuesAreLeftOutAndCounted() {
        List<TimedValue> values = new ArrayList<>();
        for (int m = 0; m < 30; m++) { // 24 used values of 10, 6 flagged ones of 1000
            boolean flagged = m % 5 == 0;
            values.add(new TimedValue(T0.plus(Duration.ofMinutes(m)), flagged ? 1000 : 10, 0, 0, 0,
                    flagged ? "flagged: residual" : ""));
        }
        PeriodAverage a = halfHour.average(values).get(0);
        assertEquals(10.0, a.mean(), 1e-12);
        assertEquals(24, a.count());
        assertEquals(6, a.excluded());
        assertEquals(80.0, a.capturePercent(), 1e-12);
        assertTrue(a.valid());
    }

    @Test
    void randomPartAveragesDownAndSystematicPartDoesNot() {
        // Monte Carlo as the outside truth: each trial draws one offset common to the period (systematic,
        // u_s = 2) and independent noise per minute (random, u_r = 3); the spread of 4000 period means must
        // match sqrt(u_r^2 / 30 + u_s^2) = 2.1213 that the averaging states, within 5 %
        java.util.Random rnd = new java.util.Random(11);
        double[] means = new double[4000];
        double stated = Double.NaN;
        for (int trial = 0; trial < means.length; trial++) {
            double offset = 2 * rnd.nextGaussian();
            List<TimedValue> values = new ArrayList<>();
            for (int m = 0; m < 30; m++) {
                values.add(new TimedValue(T0.plus(Duration.ofMinutes(m)), 50 + offset + 3 * rnd.nextGaussian(), 3, 2,
                        0, ""));
            }
            PeriodAverage a = halfHour.average(values).get(0);
            means[trial] = a.mean();
            stated = a.combinedUncertainty();
            assertEquals(3 / Math.sqrt(30), a.randomUncertainty(), 1e-12);
            assertEquals(2, a.systematicUncertainty(), 1e-12);
        }
        double mean = java.util.Arrays.stream(means).average().orElseThrow();
        double sd = Math.sqrt(java.util.Arrays.stream(means).map(v -> (v - mean) * (v - mean)).sum()
                / (means.length - 1));
        assertEquals(Math.sqrt(9.0 / 30 + 4), stated, 1e-12);
        assertEquals(stated, sd, 0.05 * stated);
    }

    @Test
    void valuesBelowTheDetectionLimitEnterByTheStatedConvention() {
        List<TimedValue> values = new ArrayList<>();
        for (int m = 0; m < 30; m++) { // half at 4 (above the limit of 2), half at -1 (below)
            values.add(new TimedValue(T0.plus(Duration.ofMinutes(m)), m < 15 ? 4 : -1, 0, 0, 2, ""));
        }
        assertEquals(1.5, mean(values, DetectionLimitConvention.AS_MEASURED), 1e-12);
        assertEquals(2.0, mean(values, DetectionLimitConvention.ZERO), 1e-12);
        assertEquals(2.5, mean(values, DetectionLimitConvention.HALF_LIMIT), 1e-12);
        assertEquals(3.0, mean(values, DetectionLimitConvention.LIMIT), 1e-12);
        Averaging a = new Averaging(Duration.ofMinutes(30), Duration.ofMinutes(1), ValidityRule.commonPractice(),
                DetectionLimitConvention.HALF_LIMIT, ZoneOffset.UTC);
        assertEquals(15, a.average(values).get(0).belowDetectionLimit());
        assertTrue(a.convention().statement().contains("half the limit"));
    }

    private static double mean(List<TimedValue> values, DetectionLimitConvention c) {
        return new Averaging(Duration.ofMinutes(30), Duration.ofMinutes(1), ValidityRule.commonPractice(), c,
                ZoneOffset.UTC).average(values).get(0).mean();
    }

    @Test
    void iedDailyRuleAllowsFiveDiscardedHalfHoursAndSaysSo() {
        // EU IED 2010/75/EU Annex VI Part 8 point 1.2: no more than five half-hourly averages of a day discarded
        Averaging daily = new Averaging(Duration.ofDays(1), Duration.ofMinutes(30),
                ValidityRule.iedDailyFromHalfHours(), DetectionLimitConvention.AS_MEASURED, ZoneOffset.UTC);
        Instant day = Instant.parse("2026-03-02T00:00:00Z");
        List<TimedValue> fiveDiscarded = new ArrayList<>();
        List<TimedValue> sixDiscarded = new ArrayList<>();
        for (int h = 0; h < 48; h++) {
            Instant t = day.plus(Duration.ofMinutes(30L * h));
            fiveDiscarded.add(new TimedValue(t, 20, 0, 0, 0, h < 5 ? "invalid period" : ""));
            sixDiscarded.add(new TimedValue(t.plus(Duration.ofDays(1)), 20, 0, 0, 0, h < 6 ? "invalid period" : ""));
        }
        fiveDiscarded.addAll(sixDiscarded);
        List<PeriodAverage> days = daily.average(fiveDiscarded);
        assertTrue(days.get(0).valid());
        assertEquals(5, days.get(0).excluded());
        assertFalse(days.get(1).valid());
        assertTrue(daily.validityRule().source().contains("Annex VI Part 8 point 1.2"));
        assertTrue(daily.validityRule().statement().contains("no more than 5 of its 48"),
                daily.validityRule().statement());
        // the IED rule is about days of half-hours; labelling 30-minute averages of minutes with it is refused
        assertThrows(IllegalArgumentException.class, () -> new Averaging(Duration.ofMinutes(30),
                Duration.ofMinutes(1), ValidityRule.iedDailyFromHalfHours(), DetectionLimitConvention.AS_MEASURED,
                ZoneOffset.UTC));
        // any other fraction is the test plan's, not the IED's
        assertTrue(new Averaging(Duration.ofDays(1), Duration.ofMinutes(30), 0.9, ZoneOffset.UTC).validityRule()
                .source().contains("test plan"));
    }

    @Test
    void anInvalidHalfHourIsDiscardedFromTheDay() {
        PeriodAverage invalid = new PeriodAverage(T0, T0.plus(Duration.ofMinutes(30)), 99, 10, 20, 0, 30, false, 1,
                1);
        assertTrue(invalid.asTimedValue().excluded());
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
