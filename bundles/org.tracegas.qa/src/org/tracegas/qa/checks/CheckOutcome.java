package org.tracegas.qa.checks;

import org.tracegas.qa.internal.Format;
import org.tracegas.qa.internal.Require;

/**
 * Immutable outcome of one QA check.
 *
 * @param check    name of the check, for example "CTS path length"
 * @param passed   whether the measured value lies within the limits
 * @param measured the value that was judged
 * @param unit     unit of the measured value and the limits
 * @param limits   acceptance limits
 * @param rule     the rule that decided and its source
 */
public record CheckOutcome(String check, boolean passed, double measured, String unit, AcceptanceLimits limits,
        Rule rule) {

    public CheckOutcome {
        Require.text("check", check);
        Require.notNull("unit", unit);
        Require.notNull("limits", limits);
        Require.notNull("rule", rule);
    }

    /** Judges a measured value against limits. */
    public static CheckOutcome judge(String check, double measured, String unit, AcceptanceLimits limits,
            Rule rule) {
        Require.notNull("limits", limits);
        return new CheckOutcome(check, Double.isFinite(measured) && limits.contains(measured), measured, unit,
                limits, rule);
    }

    /** One line for a report, for example "CTS drift: 1.2 % (limits <= 5) pass". */
    public String summary() {
        return check + ": " + Format.number(measured) + " " + unit + " (limits " + limits.describe() + ") "
                + (passed ? "pass" : "FAIL");
    }
}
