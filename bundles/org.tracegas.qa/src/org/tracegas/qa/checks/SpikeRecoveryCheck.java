package org.tracegas.qa.checks;

import java.util.List;
import java.util.Locale;

import org.tracegas.qa.internal.Require;

/** Analyte spike recovery with a tracer gas for the dilution: the mean recovery must lie within limits. */
public final class SpikeRecoveryCheck {

    /** 70 % .. 130 % of the expected spiked concentration. */
    public static final AcceptanceLimits METHOD_320_LIMITS = new AcceptanceLimits(70.0, 130.0);

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

    public CheckOutcome evaluate(String analyte, SpikeGas gas, List<SpikedSample> samples) {
        Require.text("analyte", analyte);
        double mean = recoveries(gas, samples).stream().mapToDouble(SpikeRecovery::recoveryPercent).average()
                .orElseThrow();
        Rule rule = new Rule(String.format(Locale.ROOT,
                "Mean spike recovery R = measured/expected·100 over %d spiked samples within %s %%, with "
                        + "expected = DF·C_spike + (1−DF)·C_native and DF from the tracer",
                samples.size(), limits.describe()),
                "EPA Method 320 sections 8.6.2 and 9.2.3; ASTM D6348 annex on analyte spiking "
                        + "(figures from memory, not confirmed against the official texts)");
        return CheckOutcome.judge("Spike recovery " + analyte, mean, "%", limits, rule);
    }
}
