package org.tracegas.qa.checks;

import java.util.Arrays;

import org.tracegas.qa.internal.Format;
import org.tracegas.qa.internal.Require;
import org.tracegas.qa.internal.Stats;

/**
 * Noise of an absorbance spectrum of zero gas ratioed against the background: the root-mean-square
 * deviation of the absorbance from its mean within a region.
 */
public final class NoiseCheck {

    private final AbsorbanceRegion region;
    private final double maximumRms;

    /**
     * @param region     region to evaluate, free of absorption bands
     * @param maximumRms highest acceptable RMS absorbance, set by the test plan
     */
    public NoiseCheck(AbsorbanceRegion region, double maximumRms) {
        this.region = Require.notNull("region", region);
        this.maximumRms = Require.positive("maximumRms", maximumRms);
    }

    /**
     * RMS deviation sqrt(Σ(A_i − Ā)²/n) of the absorbance points inside the region.
     *
     * @throws IllegalArgumentException if the arrays differ in length or fewer than 2 points fall in the region
     */
    public double rmsNoise(double[] wavenumbers, double[] absorbance) {
        Require.notNull("wavenumbers", wavenumbers);
        Require.notNull("absorbance", absorbance);
        if (wavenumbers.length != absorbance.length) {
            throw new IllegalArgumentException("wavenumbers has " + wavenumbers.length
                    + " points but absorbance has " + absorbance.length);
        }
        double[] inside = new double[absorbance.length];
        int n = 0;
        for (int i = 0; i < wavenumbers.length; i++) {
            if (region.contains(wavenumbers[i])) {
                inside[n++] = absorbance[i];
            }
        }
        if (n < 2) {
            throw new IllegalArgumentException("noise region " + region.fromCm() + " .. " + region.toCm()
                    + " cm-1 holds " + n + " points, at least 2 are needed");
        }
        return Stats.rmsDeviation(Arrays.copyOf(inside, n));
    }

    public CheckOutcome evaluate(double[] wavenumbers, double[] absorbance) {
        double rms = rmsNoise(wavenumbers, absorbance);
        Rule rule = new Rule("RMS absorbance noise sqrt(sum((A_i - mean)^2)/n) in "
                + Format.number(region.fromCm()) + " .. " + Format.number(region.toCm()) + " cm-1 at most "
                + Format.number(maximumRms),
                "noise definition: EPA FTIR Protocol appendix A (not confirmed against the official text); "
                        + "limit: test plan (ASTM D6348 introduction: the tester sets detection limits and DQOs)");
        return CheckOutcome.judge("Noise level", rms, "absorbance", AcceptanceLimits.atMost(maximumRms), rule);
    }
}
