package org.tracegas.qa.basis;

/**
 * A valid period average above a limit.
 *
 * @param limit          the limit exceeded
 * @param average        the period average
 * @param validatedValue the average less the confidence interval, which was compared with the limit
 */
public record Exceedance(EmissionLimit limit, PeriodAverage average, double validatedValue) {
}
