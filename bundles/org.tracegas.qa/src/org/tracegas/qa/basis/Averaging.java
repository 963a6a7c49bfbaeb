package org.tracegas.qa.basis;

import java.time.Duration;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.List;
import java.util.TreeMap;

import org.tracegas.qa.checks.Rule;
import org.tracegas.qa.internal.Require;

/**
 * Averaging over periods of fixed length aligned to period starts (multiples of the length counted from
 * midnight at a fixed UTC offset). Excluded values (flagged or invalid) are left out and counted; values below
 * their detection limit enter by a stated {@link DetectionLimitConvention}; a period is valid by its
 * {@link ValidityRule}; the random and systematic parts of the uncertainty are propagated apart.
 */
public final class Averaging {

    /** A period is valid with at least 75 % of its expected values: common practice, no source. */
    public static final double COMMON_PRACTICE_MINIMUM_FRACTION = 0.75;

    private final Duration length;
    private final Duration sampleInterval;
    private final ValidityRule rule;
    private final DetectionLimitConvention convention;
    private final ZoneOffset alignment;

    /**
     * Averages with a minimum fraction of data, values below their detection limit as measured.
     *
     * @param minimumFraction fraction of the expected values a valid period needs, in (0, 1]; 0.75 is labelled
     *                        common practice, any other fraction as stated by the test plan
     */
    public Averaging(Duration length, Duration sampleInterval, double minimumFraction, ZoneOffset alignment) {
        this(length, sampleInterval, minimumFraction == COMMON_PRACTICE_MINIMUM_FRACTION
                ? ValidityRule.commonPractice()
                : ValidityRule.minimumFraction(minimumFraction, "as stated by the test plan"),
                DetectionLimitConvention.AS_MEASURED, alignment);
    }

    /**
     * @param length         period length, for example 30 minutes; a whole number of sample intervals
     * @param sampleInterval interval between values, for example 1 minute
     * @param rule           when a period is valid
     * @param convention     how values below their detection limit enter the mean
     * @param alignment      UTC offset of the midnight the periods are counted from
     * @throws IllegalArgumentException if the IED daily rule is given for anything but daily averages of
     *                                  half-hourly values
     */
    public Averaging(Duration length, Duration sampleInterval, ValidityRule rule,
            DetectionLimitConvention convention, ZoneOffset alignment) {
        Require.notNull("length", length);
        Require.notNull("sampleInterval", sampleInterval);
        Require.notNull("rule", rule);
        Require.notNull("convention", convention);
        Require.notNull("alignment", alignment);
        if (length.isNegative() || length.isZero() || sampleInterval.isNegative() || sampleInterval.isZero()) {
            throw new IllegalArgumentException("length and sampleInterval must be positive, were " + length
                    + " and " + sampleInterval);
        }
        if (length.toMillis() % sampleInterval.toMillis() != 0) {
            throw new IllegalArgumentException("length " + length + " is not a whole number of sample intervals "
                    + sampleInterval);
        }
        long day = Duration.ofDays(1).toMillis();
        if (day % length.toMillis() != 0 && length.toMillis() % day != 0) {
            throw new IllegalArgumentException("length " + length
                    + " must divide a day or be whole days, so that periods align with midnight");
        }
        if (rule.equals(ValidityRule.iedDailyFromHalfHours())
                && !(length.equals(Duration.ofDays(1)) && sampleInterval.equals(Duration.ofMinutes(30)))) {
            throw new IllegalArgumentException("the IED rule applies to daily averages of half-hourly values, not "
                    + length + " averages of " + sampleInterval + " values");
        }
        this.length = length;
        this.sampleInterval = sampleInterval;
        this.rule = rule;
        this.convention = convention;
        this.alignment = alignment;
    }


    public Duration length() {
        return length;
    }

    public int expectedCount() {
        return (int) (length.toMillis() / sampleInterval.toMillis());
    }

    /** The minimum-data rule in words, with its source. */
    public Rule validityRule() {
        return rule.describe(describe(length), expectedCount());
    }

    /** How values below their detection limit enter the mean. */
    public DetectionLimitConvention convention() {
        return convention;
    }

    /** Start of the period that contains a time. */
    public Instant periodStart(Instant time) {
        long origin = alignment.getTotalSeconds() * -1000L; // midnight at the offset, in UTC epoch millis
        long ms = length.toMillis();
        long t = time.toEpochMilli() - origin;
        return Instant.ofEpochMilli(Math.floorDiv(t, ms) * ms + origin);
    }

    /**
     * Averages of all periods that hold at least one value, used or excluded, in time order. A period whose
     * values are all excluded has a NaN mean and is invalid.
     *
     * @throws IllegalArgumentException if a period holds more values than the sample interval allows
     */
    public List<PeriodAverage> average(List<TimedValue> values) {
        Require.notNull("values", values);
        TreeMap<Instant, List<TimedValue>> byPeriod = new TreeMap<>();
        for (TimedValue v : values) {
            byPeriod.computeIfAbsent(periodStart(v.time()), k -> new ArrayList<>()).add(v);
        }
        int expected = expectedCount();
        int needed = rule.needed(expected);
        List<PeriodAverage> out = new ArrayList<>(byPeriod.size());
        byPeriod.forEach((start, in) -> {
            if (in.size() > expected) {
                throw new IllegalArgumentException("period starting " + start + " holds " + in.size()
                        + " values, more than the " + expected + " expected at the sample interval " + sampleInterval);
            }
            double sum = 0;
            double randomVariance = 0;
            double systematic = 0;
            int used = 0;
            int below = 0;
            for (TimedValue v : in) {
                if (v.excluded()) {
                    continue;
                }
                used++;
                if (v.detectionLimit() > 0 && v.value() < v.detectionLimit()) {
                    below++;
                }
                sum += convention.apply(v.value(), v.detectionLimit());
                randomVariance += v.randomUncertainty() * v.randomUncertainty();
                systematic += v.systematicUncertainty();
            }
            double mean = used == 0 ? Double.NaN : sum / used;
            out.add(new PeriodAverage(start, start.plus(length), mean, used, in.size() - used, below, expected,
                    used > 0 && used >= needed, used == 0 ? Double.NaN : Math.sqrt(randomVariance) / used,
                    used == 0 ? Double.NaN : systematic / used));
        });
        return List.copyOf(out);
    }

    static String describe(Duration d) {
        if (d.toDays() > 0 && d.equals(Duration.ofDays(d.toDays()))) {
            return d.toDays() == 1 ? "daily" : d.toDays() + "-day";
        }
        if (d.toHours() > 0 && d.equals(Duration.ofHours(d.toHours()))) {
            return d.toHours() == 1 ? "hourly" : d.toHours() + "-hour";
        }
        if (d.toMinutes() > 0 && d.equals(Duration.ofMinutes(d.toMinutes()))) {
            return d.toMinutes() + "-minute";
        }
        return d.toSeconds() + "-second";
    }
}
