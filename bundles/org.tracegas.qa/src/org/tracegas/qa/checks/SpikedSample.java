package org.tracegas.qa.checks;

import org.tracegas.qa.internal.Require;

/**
 * One spiked sample with the native (unspiked) analyte level next to it.
 *
 * @param tracerPpm         tracer measured in the spiked sample
 * @param analytePpm        analyte measured in the spiked sample
 * @param nativeAnalytePpm  analyte measured in the unspiked sample
 */
public record SpikedSample(double tracerPpm, double analytePpm, double nativeAnalytePpm) {

    public SpikedSample {
        Require.nonNegative("tracerPpm", tracerPpm);
        Require.finite("analytePpm", analytePpm);
        Require.finite("nativeAnalytePpm", nativeAnalytePpm);
    }
}
