package org.tracegas.qa.checks;

import java.util.List;
import java.util.Locale;

import org.tracegas.qa.internal.Require;

/** Analyte spike recovery with a tracer gas for the dilution: the mean recovery must lie within limits. */
public final class SpikeRecoveryCheck {

    /** 70 % .. 130 % of the expected spiked concentration. */
    public static final AcceptanceLimits METHOD_320_LIMITS = new AcceptanceLimits(70.0, 130.0);

    /** Largest dilution factor: spike flow at most 10 % of the total sample flow. */
    public static final double METHOD_320_MAXIMUM_DILUTION_FACTOR = 0.10;

    private final AcceptanceLimits limits;

    public SpikeRecoveryCheck(AcceptanceLimits limits) {
        this.limits = Require.notNull("limits", limits);
    }

    public List<SpikeRecovery> recoveries(SpikeGas gas, List<SpikedSample> samples) {
        if (samples == null || samples.isEmpty()) {
            throw new IllegalArgumentException("samples must hold at least one spiked sample");
        }
        return samples.stream().map(s -> SpikeRecovery.of(gas, s)).toList();
    }

    /**
     * The dilution of the spike in the sample stream, DF = tracer in the spiked sample / tracer in the spike gas
     * measured directly: the spike flow must be at most {@link #METHOD_320_MAXIMUM_DILUTION_FACTOR} of the total,
     * so that the spiked sample stays the stack gas; the largest DF of the samples is judged.
     */
    public CheckOutcome dilution(String analyte, SpikeGas gas, List<SpikedSample> samples) {
        Require.text("analyte", analyte);
        double largest = recoveries(gas, samples).stream().mapToDouble(SpikeRecovery::dilutionFactor).max()
                .orElseThrow();
        Rule rule = new Rule(String.format(Locale.ROOT, "Dilution factor DF = tracer(spiked sample) / tracer(spike "
                + "gas measured directly) of each of %d spiked samples at most %s (spike flow at most 10 %% of the "
                + "total flow); spike gas from the %s", samples.size(),
                Double.toString(METHOD_320_MAXIMUM_DILUTION_FACTOR), gas.origin()),
                "EPA Method 320 section 9.2 (not confirmed against the official text)");
        return CheckOutcome.judge("Spike dilution " + analyte, largest, "",
                AcceptanceLimits.atMost(METHOD_320_MAXIMUM_DILUTION_FACTOR), rule);
    }

    public CheckOutcome evaluate(String analyte, SpikeGas gas, List<SpikedSample> samples) {
        Require.text("analyte", analyte);
        double mean = recoveries(gas, samples).stream().mapToDouble(SpikeRecovery::recoveryPercent).average()
                .orElseThrow();
        Rule rule = new Rule(String.format(Locale.ROOT,
                "Mean spike recovery R = measured/expected·100 over %d spiked samples within %s %%, with "
                        + "expected = DF·C_spike + (1−DF)·C_native and DF from the tracer; spike gas from the %s",
                samples.size(), limits.describe(), gas.origin()),
                "EPA Method 320 section 9.2.3 (DF and expected value) and section 8.6.2 (mean of at least 3 "
                        + "spiked samples within 0.7 to 1.3 of expected); not confirmed against the official text");
        return CheckOutcome.judge("Spike recovery " + analyte, mean, "%", limits, rule);
    }
}
