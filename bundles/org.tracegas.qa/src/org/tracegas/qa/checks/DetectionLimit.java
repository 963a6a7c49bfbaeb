package org.tracegas.qa.checks;

import org.tracegas.qa.internal.Format;
import org.tracegas.qa.internal.Require;
import org.tracegas.qa.internal.Stats;

/**
 * Detection limit of one analyte as three standard deviations of its noise-limited concentration.
 *
 * @param analyte name of the analyte
 * @param ppm     detection limit in ppm
 * @param basis   how it was obtained
 */
public record DetectionLimit(String analyte, double ppm, String basis) {

    public DetectionLimit {
        Require.text("analyte", analyte);
        Require.nonNegative("ppm", ppm);
        Require.text("basis", basis);
    }

    /** 3·s of repeated analyte results on zero gas (s = sample standard deviation). */
    public static DetectionLimit fromZeroReadings(String analyte, double[] zeroReadingsPpm) {
        return new DetectionLimit(analyte, 3.0 * Stats.sampleStandardDeviation(zeroReadingsPpm),
                "3 x standard deviation of " + zeroReadingsPpm.length + " zero-gas results");
    }

    /**
     * 3·noise / (absorbance per ppm): the concentration whose strongest reference band equals three times
     * the RMS absorbance noise.
     *
     * @param rmsNoise        RMS absorbance noise in the analysis region
     * @param absorbancePerPpm peak absorbance of the reference spectrum per ppm at the cell path
     */
    public static DetectionLimit fromNoise(String analyte, double rmsNoise, double absorbancePerPpm) {
        Require.nonNegative("rmsNoise", rmsNoise);
        Require.positive("absorbancePerPpm", absorbancePerPpm);
        return new DetectionLimit(analyte, 3.0 * rmsNoise / absorbancePerPpm,
                "3 x RMS noise / reference absorbance per ppm");
    }

    /** Judges the limit against the detection limit the test plan requires. */
    public CheckOutcome check(double requiredPpm) {
        Require.positive("requiredPpm", requiredPpm);
        Rule rule = new Rule("Detection limit (" + basis + ") at most " + Format.number(requiredPpm) + " ppm",
                "3-sigma convention: common practice, no source; required value: test plan "
                        + "(ASTM D6348 introduction: the tester sets detection limits)");
        return CheckOutcome.judge("Detection limit " + analyte, ppm, "ppm", AcceptanceLimits.atMost(requiredPpm),
                rule);
    }
}
