package org.tracegas.qa.checks;

import org.tracegas.qa.internal.Require;

/**
 * Spike gas as measured directly (undiluted).
 *
 * @param tracerPpm  tracer (for example SF6) concentration in the spike gas
 * @param analytePpm analyte concentration in the spike gas
 */
public record SpikeGas(double tracerPpm, double analytePpm) {

    public SpikeGas {
        Require.positive("tracerPpm", tracerPpm);
        Require.nonNegative("analytePpm", analytePpm);
    }
}
