package org.tracegas.qa.basis;

import java.time.Duration;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.TreeMap;

import org.tracegas.qa.checks.Rule;
import org.tracegas.qa.internal.Require;

/**
 * Averaging over periods of fixed length aligned to period starts (multiples of the length counted from
 * midnight at a fixed UTC offset), with a minimum-data rule: a period is valid with at least a given
 * fraction of its expected values.
 */
public final class Averaging {

    /** A period is valid with at least 75 % of its expected values: common practice, no source. */
    public static final double COMMON_PRACTICE_MINIMUM_FRACTION = 0.75;

    private final Duration length;
    private final Duration sampleInterval;
    private final double minimumFraction;
    private final ZoneOffset alignment;

    /**
     * @param length          period length, for example 30 minutes; a whole number of sample intervals
     * @param sampleInterval  interval between values, for example 1 minute
     * @param minimumFraction fraction of the expected values a valid period needs, in (0, 1]
     * @param alignment       UTC offset of the midnight the periods are counted from
     */
    public Averaging(Duration length, Duration sampleInterval, double minimumFraction, ZoneOffset alignment) {
        Require.notNull("length", length);
        Require.notNull("sampleInterval", sampleInterval);
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
        if (!(minimumFraction > 0 && minimumFraction <= 1)) {
            throw new IllegalArgumentException("minimumFraction must lie in (0, 1], was " + minimumFraction);
        }
        this.length = length;
        this.sampleInterval = sampleInterval;
        this.minimumFraction = minimumFraction;
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
        return new Rule(String.format(Locale.ROOT,
                "A %s average is valid with at least %.0f %% of its %d expected values", describe(length),
                minimumFraction * 100, expectedCount()),
                minimumFraction == COMMON_PRACTICE_MINIMUM_FRACTION ? "common practice, no source"
                        : "test plan (EU IED 2010/75/EU Annex VI Part 8 section 1.2: a day is valid if no more than "
                                + "5 half-hourly averages were discarded)");
    }

    /** Start of the period that contains a time. */
    public Instant periodStart(Instant time) {
        long origin = alignment.getTotalSeconds() * -1000L; // midnight at the offset, in UTC epoch millis
        long ms = length.toMillis();
        long t = time.toEpochMilli() - origin;
        return Instant.ofEpochMilli(Math.floorDiv(t, ms) * ms + origin);
    }

    /** Averages of all periods that hold at least one value, in time order. */
    public List<PeriodAverage> average(List<TimedValue> values) {
        Require.notNull("values", values);
        TreeMap<Instant, double[]> sums = new TreeMap<>(); // start -> {sum, count}
        for (TimedValue v : values) {
            double[] s = sums.computeIfAbsent(periodStart(v.time()), k -> new double[2]);
            s[0] += v.value();
            s[1] += 1;
        }
        int expected = expectedCount();
        int needed = (int) Math.ceil(minimumFraction * expected - 1e-9);
        List<PeriodAverage> out = new ArrayList<>(sums.size());
        sums.forEach((start, s) -> {
            int count = (int) s[1];
            if (count > expected) {
                throw new IllegalArgumentException("period starting " + start + " holds " + count
                        + " values, more than the " + expected + " expected at the sample interval " + sampleInterval);
            }
            out.add(new PeriodAverage(start, start.plus(length), s[0] / count, count, expected, count >= needed));
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
