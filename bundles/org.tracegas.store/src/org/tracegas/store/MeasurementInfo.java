package org.tracegas.store;

import java.time.Instant;

import org.tracegas.model.MeasurementKind;

/**
 * A stored measurement: what it was, when, and the cell conditions.
 *
 * @param cellTemperature K
 * @param cellPressure    hPa
 */
public record MeasurementInfo(String id, String projectId, MeasurementKind kind, Instant time, double cellTemperature,
        double cellPressure, String operatorId) {
}
