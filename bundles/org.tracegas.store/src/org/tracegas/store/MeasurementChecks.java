package org.tracegas.store;

import java.time.Instant;

import org.tracegas.model.MeasurementKind;

/** The checks every new measurement's fields pass, whichever way it is stored. */
final class MeasurementChecks {

    private MeasurementChecks() {
    }

    /** @throws IllegalArgumentException naming the field that is missing or wrong */
    static void require(MeasurementKind kind, Instant time, double cellTemperature, double cellPressure) {
        if (kind == null) {
            throw new IllegalArgumentException("kind must not be null");
        }
        if (time == null) {
            throw new IllegalArgumentException("time must not be null");
        }
        if (!(cellTemperature > 0)) {
            throw new IllegalArgumentException("cellTemperature must be a positive number of K, was "
                    + cellTemperature);
        }
        if (!(cellPressure > 0)) {
            throw new IllegalArgumentException("cellPressure must be a positive number of hPa, was " + cellPressure);
        }
    }
}
