package org.tracegas.qa.basis;

import java.time.Duration;

import org.tracegas.qa.internal.Require;

/**
 * A client's emission limit for one compound.
 *
 * @param compound name of the compound
 * @param value    limit value, on the reporting basis
 * @param basis    description of the basis, for example "mg/m³ dry, 273.15 K, 101.3 kPa, 10 % O2"
 * @param period   averaging period the limit applies to
 */
public record EmissionLimit(String compound, double value, String basis, Duration period) {

    public EmissionLimit {
        Require.text("compound", compound);
        Require.positive("value", value);
        Require.text("basis", basis);
        Require.notNull("period", period);
    }
}
