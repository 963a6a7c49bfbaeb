package org.tracegas.report;

import org.tracegas.qa.checks.CheckOutcome;
import org.tracegas.report.internal.Check;
import org.tracegas.report.internal.Numbers;

/**
 * One QA check as the report shows it.
 *
 * @param check    name of the check
 * @param passed   its outcome
 * @param measured the measured value with unit, as text
 * @param limits   acceptance limits with unit, as text
 * @param rule     the rule that decided
 * @param source   where the rule comes from
 */
public record QaLine(String check, boolean passed, String measured, String limits, String rule, String source) {

    public QaLine {
        Check.text("check", check);
        Check.notNull("measured", measured);
        Check.notNull("limits", limits);
        Check.text("rule", rule);
        Check.text("source", source);
    }

    public static QaLine of(CheckOutcome outcome) {
        Check.notNull("outcome", outcome);
        String unit = outcome.unit().isEmpty() ? "" : " " + outcome.unit();
        String measured = Numbers.significant(outcome.measured()) + unit;
        return new QaLine(outcome.check(), outcome.passed(), measured, outcome.limits().describe() + unit,
                outcome.rule().statement(), outcome.rule().source());
    }
}
