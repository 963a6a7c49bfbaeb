package org.tracegas.qa.checks;

import org.tracegas.qa.internal.Format;

/** Closed acceptance interval [lower, upper]; an infinite bound means no limit on that side. */
public record AcceptanceLimits(double lower, double upper) {

    public AcceptanceLimits {
        if (Double.isNaN(lower) || Double.isNaN(upper) || lower > upper) {
            throw new IllegalArgumentException("acceptance limits must satisfy lower <= upper, were "
                    + lower + " and " + upper);
        }
    }

    public static AcceptanceLimits atMost(double upper) {
        return new AcceptanceLimits(Double.NEGATIVE_INFINITY, upper);
    }

    /** nominal ± percent of nominal. */
    public static AcceptanceLimits relative(double nominal, double percent) {
        double half = Math.abs(nominal) * percent / 100.0;
        return new AcceptanceLimits(nominal - half, nominal + half);
    }

    public boolean contains(double value) {
        return value >= lower && value <= upper;
    }

    /** For example "9.5 .. 10.5" or "<= 2". */
    public String describe() {
        if (lower == Double.NEGATIVE_INFINITY && upper == Double.POSITIVE_INFINITY) {
            return "any";
        }
        if (lower == Double.NEGATIVE_INFINITY) {
            return "<= " + format(upper);
        }
        if (upper == Double.POSITIVE_INFINITY) {
            return ">= " + format(lower);
        }
        return format(lower) + " .. " + format(upper);
    }

    private static String format(double v) {
        return Format.number(v);
    }
}
