package org.tracegas.qa.basis;

import org.tracegas.qa.internal.Require;

/**
 * A value with the time it refers to (start of the measurement), its standard uncertainty split into the part
 * that varies from value to value (random: spectral noise) and the part common to all values (systematic:
 * reference spectra, path, temperature and pressure calibration), its detection limit, and why it is excluded
 * from averages, if it is.
 *
 * @param time                  time of the value
 * @param value                 the value
 * @param randomUncertainty     random part of the standard uncertainty, same unit, 0 if not known
 * @param systematicUncertainty systematic part of the standard uncertainty, same unit, 0 if not known
 * @param detectionLimit        detection limit in the same unit, 0 if none applies
 * @param exclusion             why the value is left out of averages (flagged or invalid), empty if it is used
 */
public record TimedValue(java.time.Instant time, double value, double randomUncertainty,
        double systematicUncertainty, double detectionLimit, String exclusion) {

    public TimedValue {
        Require.notNull("time", time);
        Require.finite("value", value);
        Require.nonNegative("randomUncertainty", randomUncertainty);
        Require.nonNegative("systematicUncertainty", systematicUncertainty);
        Require.nonNegative("detectionLimit", detectionLimit);
        Require.notNull("exclusion", exclusion);
    }

    /** A used value without uncertainty or detection limit. */
    public TimedValue(java.time.Instant time, double value) {
        this(time, value, 0, 0, 0, "");
    }

    /** Whether the value is left out of averages. */
    public boolean excluded() {
        return !exclusion.isEmpty();
    }
}
