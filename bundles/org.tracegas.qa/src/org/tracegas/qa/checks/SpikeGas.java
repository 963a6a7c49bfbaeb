package org.tracegas.qa.checks;

import org.tracegas.qa.internal.Require;

/**
 * Spike gas contents. They should be what the spectrometer measured when the spike gas went to it directly
 * (undiluted, through the sampling system), not what the cylinder label says: the recovery then tests the
 * sampling system and the analysis rather than the label (EPA Method 320 section 9.2, not confirmed against the
 * official text). The origin says which it was, and the checks state it.
 *
 * @param tracerPpm  tracer (for example SF6) concentration in the spike gas
 * @param analytePpm analyte concentration in the spike gas
 * @param origin     where the two values come from, for example "measured directly, mean of 3 readings"
 */
public record SpikeGas(double tracerPpm, double analytePpm, String origin) {

    /** Origin of contents taken from the cylinder label. */
    public static final String CYLINDER_LABEL = "cylinder label (no direct reading of the spike gas)";

    public SpikeGas {
        Require.positive("tracerPpm", tracerPpm);
        Require.nonNegative("analytePpm", analytePpm);
        Require.text("origin", origin);
    }

    /** Contents as the cylinder label gives them. */
    public SpikeGas(double tracerPpm, double analytePpm) {
        this(tracerPpm, analytePpm, CYLINDER_LABEL);
    }
}
