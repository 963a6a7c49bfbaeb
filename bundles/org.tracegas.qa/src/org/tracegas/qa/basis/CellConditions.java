package org.tracegas.qa.basis;

import org.tracegas.qa.internal.Require;

/**
 * The conditions of the sample cell that a result is corrected to: temperature, pressure and absorption path,
 * each with where it came from.
 *
 * @param temperatureK cell temperature in K
 * @param pressureKPa  cell pressure in kPa
 * @param pathM        absorption path in m
 * @param pathOrigin   nominal or derived from a CTS measurement
 */
public record CellConditions(ConditionValue temperatureK, ConditionValue pressureKPa, double pathM,
        PathOrigin pathOrigin) {

    public CellConditions {
        Require.notNull("temperatureK", temperatureK);
        Require.notNull("pressureKPa", pressureKPa);
        Require.positive("pathM", pathM);
        Require.notNull("pathOrigin", pathOrigin);
    }
}
