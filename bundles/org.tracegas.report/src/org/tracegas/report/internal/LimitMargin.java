package org.tracegas.report.internal;

import java.math.BigDecimal;
import java.util.OptionalDouble;

/**
 * How far a QA reading lies from its acceptance limits, read back from the texts the report prints (a number
 * and unit; limits "a .. b", "<= b" or ">= a" with the same unit). The margin is 0 on a limit, negative inside
 * and positive outside, relative to the half-width of a two-sided interval or to the size of a one-sided bound,
 * so readings of one check can be ranked even when their limits differ.
 */
public final class LimitMargin {

    private LimitMargin() {
    }

    /** The margin, or empty when the texts are not in the form {@code QaLine.of} writes. */
    public static OptionalDouble of(String measured, String limits) {
        String[] m = numberAndUnit(measured);
        if (m == null) {
            return OptionalDouble.empty();
        }
        double v = Double.parseDouble(m[0]);
        String unitSuffix = m[1].isEmpty() ? "" : " " + m[1];
        if (!limits.endsWith(unitSuffix)) {
            return OptionalDouble.empty();
        }
        String bounds = limits.substring(0, limits.length() - unitSuffix.length());
        if (bounds.startsWith("<= ")) {
            Double b = number(bounds.substring(3));
            return b == null ? OptionalDouble.empty() : OptionalDouble.of(relative(v - b, b));
        }
        if (bounds.startsWith(">= ")) {
            Double a = number(bounds.substring(3));
            return a == null ? OptionalDouble.empty() : OptionalDouble.of(relative(a - v, a));
        }
        int dots = bounds.indexOf(" .. ");
        if (dots < 0) {
            return OptionalDouble.empty();
        }
        Double a = number(bounds.substring(0, dots));
        Double b = number(bounds.substring(dots + 4));
        if (a == null || b == null || a > b) {
            return OptionalDouble.empty();
        }
        double half = (b - a) / 2;
        double off = Math.abs(v - (a + b) / 2);
        return OptionalDouble.of(half > 0 ? off / half - 1 : off);
    }

    private static double relative(double excess, double bound) {
        return bound == 0 ? excess : excess / Math.abs(bound);
    }

    private static String[] numberAndUnit(String text) {
        int space = text.indexOf(' ');
        String n = space < 0 ? text : text.substring(0, space);
        return number(n) == null ? null : new String[] {n, space < 0 ? "" : text.substring(space + 1)};
    }

    private static Double number(String text) {
        try {
            double v = new BigDecimal(text).doubleValue();
            return Double.isFinite(v) ? v : null;
        } catch (NumberFormatException e) {
            return null;
        }
    }
}
