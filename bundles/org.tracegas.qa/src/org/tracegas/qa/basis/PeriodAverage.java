package org.tracegas.qa.basis;

import java.time.Instant;

/**
 * Mean of the values in one averaging period [start, end).
 *
 * @param start    period start (aligned)
 * @param end      period end, exclusive
 * @param mean     mean of the values in the period
 * @param count    number of values in the period, at least 1
 * @param expected number of values a complete period holds
 * @param valid    whether the period meets the minimum-data rule
 */
public record PeriodAverage(Instant start, Instant end, double mean, int count, int expected, boolean valid) {

    /** Data capture in percent: count / expected · 100. */
    public double capturePercent() {
        return 100.0 * count / expected;
    }

    /** The mean as a value at the period start, for averaging valid periods further. */
    public TimedValue asTimedValue() {
        return new TimedValue(start, mean);
    }
}
