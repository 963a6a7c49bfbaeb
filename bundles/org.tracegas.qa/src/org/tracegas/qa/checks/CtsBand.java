package org.tracegas.qa.checks;

import org.tracegas.qa.internal.Require;

/**
 * Band absorbance of a calibration transfer standard (CTS) gas with its concentration and the cell
 * conditions at which it was recorded.
 *
 * @param absorbance        integrated or peak band absorbance (same measure for reference and measurement), with
 *                          its sign: a band at or below zero is inverted (the CTS gas in the background, or the
 *                          ratio upside down) and must fail the checks, not be hidden by taking its magnitude
 * @param concentrationPpm  CTS gas concentration in ppm
 * @param temperatureK      cell temperature in K
 * @param pressureKPa       cell pressure in kPa
 */
public record CtsBand(double absorbance, double concentrationPpm, double temperatureK, double pressureKPa) {

    public CtsBand {
        Require.finite("absorbance", absorbance);
        Require.positive("concentrationPpm", concentrationPpm);
        Require.positive("temperatureK", temperatureK);
        Require.positive("pressureKPa", pressureKPa);
    }
}
