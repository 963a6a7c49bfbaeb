package org.tracegas.qa.checks;

import org.tracegas.qa.internal.Format;
import org.tracegas.qa.internal.Require;

/** Agreement of the CTS checks before and after a test: each must lie within a tolerance of their mean. */
public final class CtsDriftCheck {

    public static final double METHOD_320_TOLERANCE_PERCENT = 5.0;

    private final double tolerancePercent;

    public CtsDriftCheck(double tolerancePercent) {
        this.tolerancePercent = Require.positive("tolerancePercent", tolerancePercent);
    }

    /**
     * Deviation of each reading from the mean of both, in percent of the mean: |pre − post| / (pre + post)
     * · 100 (both readings deviate by the same amount).
     */
    public static double deviationFromMeanPercent(double pre, double post) {
        Require.positive("pre", pre);
        Require.positive("post", post);
        return Math.abs(pre - post) / (pre + post) * 100.0;
    }

    /**
     * @param pre  CTS result (band absorbance or concentration) before the test
     * @param post the same measure after the test
     */
    public CheckOutcome evaluate(double pre, double post) {
        double deviation = deviationFromMeanPercent(pre, post);
        Rule rule = new Rule("Pre- and post-test CTS results each within " + Format.number(tolerancePercent)
                + " % of their mean",
                "EPA Method 320 section 8.11.3 (not confirmed against the official text)");
        return CheckOutcome.judge("CTS drift", deviation, "%", AcceptanceLimits.atMost(tolerancePercent), rule);
    }
}
