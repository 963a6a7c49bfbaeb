package org.tracegas.qa.basis;

import java.time.Instant;

import org.tracegas.qa.internal.Require;

/**
 * One FTIR result of an analyte on the wet gas with the water vapour of the same spectrum and the
 * side-channel oxygen at the same time.
 *
 * @param time         time of the measurement
 * @param wetPpm       analyte volume fraction in ppm, wet gas
 * @param h2oFraction  water vapour volume fraction, 0 <= x < 1
 * @param o2PercentDry oxygen in volume percent on dry gas
 */
public record GasReading(Instant time, double wetPpm, double h2oFraction, double o2PercentDry) {

    public GasReading {
        Require.notNull("time", time);
        Require.finite("wetPpm", wetPpm);
        if (!(h2oFraction >= 0 && h2oFraction < 1)) {
            throw new IllegalArgumentException("h2oFraction must lie in [0, 1), was " + h2oFraction + " at " + time);
        }
        Require.finite("o2PercentDry", o2PercentDry);
    }
}
