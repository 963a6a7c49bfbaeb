package org.tracegas.qa.basis;

import java.time.Duration;
import java.util.List;

import org.tracegas.qa.internal.Require;

/**
 * Compares valid period averages with an emission limit. The average may first be reduced by a
 * confidence interval given as a percentage of the limit, as EU IED 2010/75/EU Annex VI Part 8 section 1.2
 * does with the interval of Part 6 section 1.3; 0 % compares the averages as they are.
 */
public final class LimitComparison {

    private final double confidenceIntervalPercent;

    public LimitComparison(double confidenceIntervalPercent) {
        if (!(confidenceIntervalPercent >= 0 && confidenceIntervalPercent < 100)) {
            throw new IllegalArgumentException("confidenceIntervalPercent must lie in [0, 100), was "
                    + confidenceIntervalPercent);
        }
        this.confidenceIntervalPercent = confidenceIntervalPercent;
    }

    /** Validated value = average − CI% · limit. */
    public double validatedValue(EmissionLimit limit, double average) {
        return average - confidenceIntervalPercent / 100.0 * limit.value();
    }

    /**
     * How one average stands: without a limit {@link LimitStatus#NO_LIMIT}; a period that fails its validity rule
     * is {@link LimitStatus#NOT_ASSESSED}, never within; otherwise the validated value against the limit.
     *
     * @param limit the limit of the compound and period, or null when none applies
     */
    public LimitStatus status(EmissionLimit limit, PeriodAverage average) {
        Require.notNull("average", average);
        if (limit == null) {
            return LimitStatus.NO_LIMIT;
        }
        if (!average.valid()) {
            return LimitStatus.NOT_ASSESSED;
        }
        return validatedValue(limit, average.mean()) > limit.value() ? LimitStatus.EXCEEDED : LimitStatus.WITHIN;
    }

    /**
     * Valid averages whose validated value exceeds the limit.
     *
     * @throws IllegalArgumentException if an average's period differs from the limit's period
     */
    public List<Exceedance> exceedances(EmissionLimit limit, List<PeriodAverage> averages) {
        Require.notNull("limit", limit);
        Require.notNull("averages", averages);
        for (PeriodAverage a : averages) {
            if (!Duration.between(a.start(), a.end()).equals(limit.period())) {
                throw new IllegalArgumentException("average starting " + a.start() + " spans "
                        + Duration.between(a.start(), a.end()) + " but the " + limit.compound()
                        + " limit applies to " + limit.period());
            }
        }
        return averages.stream().filter(PeriodAverage::valid)
                .filter(a -> validatedValue(limit, a.mean()) > limit.value())
                .map(a -> new Exceedance(limit, a, validatedValue(limit, a.mean()))).toList();
    }
}
