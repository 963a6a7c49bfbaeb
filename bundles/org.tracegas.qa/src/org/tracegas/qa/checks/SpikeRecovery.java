package org.tracegas.qa.checks;

import org.tracegas.qa.internal.Require;

/**
 * Recovery of one analyte spike.
 *
 * @param dilutionFactor DF = tracer in the spiked sample / tracer in the spike gas
 * @param expectedPpm    DF·C_spike + (1 − DF)·C_native
 * @param measuredPpm    analyte measured in the spiked sample
 * @param recoveryPercent measured / expected · 100
 */
public record SpikeRecovery(double dilutionFactor, double expectedPpm, double measuredPpm, double recoveryPercent) {

    /** Computes the recovery of one spiked sample. */
    public static SpikeRecovery of(SpikeGas gas, SpikedSample sample) {
        Require.notNull("gas", gas);
        Require.notNull("sample", sample);
        double df = sample.tracerPpm() / gas.tracerPpm();
        if (!(df > 0 && df < 1)) {
            throw new IllegalArgumentException("dilution factor must lie between 0 and 1, was " + df
                    + " (tracer " + sample.tracerPpm() + " ppm in the sample, " + gas.tracerPpm()
                    + " ppm in the spike)");
        }
        double expected = df * gas.analytePpm() + (1 - df) * sample.nativeAnalytePpm();
        Require.positive("expected spiked concentration", expected);
        return new SpikeRecovery(df, expected, sample.analytePpm(), sample.analytePpm() / expected * 100.0);
    }
}
