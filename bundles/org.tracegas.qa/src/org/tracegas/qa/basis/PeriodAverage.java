package org.tracegas.qa.basis;

import java.time.Instant;

/**
 * Mean of the used values in one averaging period [start, end), with the data availability and the two parts of
 * its standard uncertainty.
 *
 * @param start                 period start (aligned)
 * @param end                   period end, exclusive
 * @param mean                  mean of the used values, NaN when none was used
 * @param count                 number of values used
 * @param excluded              number of values in the period left out (flagged or invalid)
 * @param belowDetectionLimit   number of used values below their detection limit
 * @param expected              number of values a complete period holds
 * @param valid                 whether the period meets its validity rule
 * @param randomUncertainty     random part of the standard uncertainty of the mean: sqrt(sum u_r,i^2) / n, the
 *                              values' noise being independent
 * @param systematicUncertainty systematic part: sum u_s,i / n, fully correlated from value to value, so it does
 *                              not average down (JCGM 100:2008 5.2.2 with r = 1)
 */
public record PeriodAverage(Instant start, Instant end, double mean, int count, int excluded,
        int belowDetectionLimit, int expected, boolean valid, double randomUncertainty,
        double systematicUncertainty) {

    /** Data availability in percent: used values / expected · 100. */
    public double capturePercent() {
        return 100.0 * count / expected;
    }

    /** Combined standard uncertainty of the mean, sqrt(u_random^2 + u_systematic^2). */
    public double combinedUncertainty() {
        return Math.hypot(randomUncertainty, systematicUncertainty);
    }

    /**
     * The mean as a value at the period start, for averaging periods further: it carries the period's
     * uncertainty parts, and an invalid period is excluded there (it counts as discarded).
     */
    public TimedValue asTimedValue() {
        return new TimedValue(start, valid ? mean : 0.0, valid ? randomUncertainty : 0.0,
                valid ? systematicUncertainty : 0.0, 0.0, valid ? "" : "invalid period");
    }
}
