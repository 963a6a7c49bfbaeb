package org.tracegas.qa.basis;

import java.util.Locale;

import org.tracegas.qa.checks.Rule;
import org.tracegas.qa.internal.Require;

/**
 * When an average over a period has enough data to stand: either a minimum fraction of its expected values, or
 * at most a number of discarded ones, with the source of the rule.
 *
 * @param minimumFraction  fraction of the expected values needed, in (0, 1], or 0 when maximumDiscarded rules
 * @param maximumDiscarded most values that may be missing or discarded, or -1 when minimumFraction rules
 * @param source           where the rule comes from
 */
public record ValidityRule(double minimumFraction, int maximumDiscarded, String source) {

    /** Source of the 75 % rule. */
    public static final String COMMON_PRACTICE = "common practice, no source";

    public ValidityRule {
        Require.text("source", source);
        boolean byFraction = minimumFraction > 0 && minimumFraction <= 1 && maximumDiscarded == -1;
        boolean byCount = minimumFraction == 0 && maximumDiscarded >= 0;
        if (!byFraction && !byCount) {
            throw new IllegalArgumentException("give a minimumFraction in (0, 1] or a maximumDiscarded >= 0, "
                    + "not both; were " + minimumFraction + " and " + maximumDiscarded);
        }
    }

    /** At least 75 % of the expected values. */
    public static ValidityRule commonPractice() {
        return new ValidityRule(0.75, -1, COMMON_PRACTICE);
    }

    /** At least a fraction of the expected values, as a test plan or permit states it. */
    public static ValidityRule minimumFraction(double fraction, String source) {
        return new ValidityRule(fraction, -1, source);
    }

    /**
     * A daily average from half-hourly averages is valid when no more than five of the day's half-hourly averages
     * were discarded: EU IED 2010/75/EU Annex VI Part 8 point 1.2 (waste incineration and co-incineration).
     */
    public static ValidityRule iedDailyFromHalfHours() {
        return new ValidityRule(0, 5, "EU IED 2010/75/EU Annex VI Part 8 point 1.2");
    }

    /** How many of the expected values a valid period needs. */
    public int needed(int expected) {
        if (maximumDiscarded >= 0) {
            return Math.max(0, expected - maximumDiscarded);
        }
        return (int) Math.ceil(minimumFraction * expected - 1e-9);
    }

    /** The rule in words for a period, with its source. */
    public Rule describe(String period, int expected) {
        String statement = maximumDiscarded >= 0
                ? String.format(Locale.ROOT, "A %s average is valid with no more than %d of its %d values missing "
                        + "or discarded", period, maximumDiscarded, expected)
                : String.format(Locale.ROOT, "A %s average is valid with at least %s %% of its %d expected values "
                        + "(%d)", period, percent(minimumFraction), expected, needed(expected));
        return new Rule(statement, source);
    }

    private static String percent(double fraction) {
        double p = fraction * 100;
        return p == Math.rint(p) ? Long.toString((long) p) : String.format(Locale.ROOT, "%.1f", p);
    }
}
