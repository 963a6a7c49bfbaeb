package org.tracegas.qa.checks;

import org.tracegas.qa.internal.Format;
import org.tracegas.qa.internal.Require;

/**
 * Zero and span checks: the reading on zero gas and on a span gas against their reference values. The
 * zero drift is judged in ppm, the span drift in percent of the span reference.
 */
public final class ZeroSpanCheck {

    private static final String SOURCE = "limits: test plan or the QAL1 figures of the instrument; EN 14181 "
            + "section 7 checks zero and span against QAL1";

    private final double zeroLimitPpm;
    private final double spanLimitPercent;

    public ZeroSpanCheck(double zeroLimitPpm, double spanLimitPercent) {
        this.zeroLimitPpm = Require.positive("zeroLimitPpm", zeroLimitPpm);
        this.spanLimitPercent = Require.positive("spanLimitPercent", spanLimitPercent);
    }

    /** Zero drift = reading on zero gas (reference 0 ppm). */
    public CheckOutcome zero(String analyte, double readingPpm) {
        Require.text("analyte", analyte);
        Require.finite("readingPpm", readingPpm);
        Rule rule = new Rule("Zero reading within ±" + Format.number(zeroLimitPpm) + " ppm of 0", SOURCE);
        return CheckOutcome.judge("Zero " + analyte, readingPpm, "ppm",
                new AcceptanceLimits(-zeroLimitPpm, zeroLimitPpm), rule);
    }

    /** Span drift = (reading − reference) / reference · 100. */
    public CheckOutcome span(String analyte, double readingPpm, double referencePpm) {
        Require.text("analyte", analyte);
        Require.finite("readingPpm", readingPpm);
        Require.positive("referencePpm", referencePpm);
        double drift = (readingPpm - referencePpm) / referencePpm * 100.0;
        Rule rule = new Rule("Span reading within ±" + Format.number(spanLimitPercent) + " % of the span gas value "
                + Format.number(referencePpm) + " ppm", SOURCE);
        return CheckOutcome.judge("Span " + analyte, drift, "%",
                new AcceptanceLimits(-spanLimitPercent, spanLimitPercent), rule);
    }
}
