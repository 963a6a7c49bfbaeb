package org.tracegas.qa.checks;

import org.tracegas.qa.internal.Require;
import org.tracegas.spectrum.Spectrum;

/**
 * A reference spectrum of the method's library with the conditions it was recorded at.
 *
 * @param spectrum     absorbance of the reference
 * @param ppmMetres    its concentration-path length, ppm·m
 * @param temperatureK its cell temperature
 * @param pressureKPa  its cell pressure
 */
public record QaReference(Spectrum spectrum, double ppmMetres, double temperatureK, double pressureKPa) {

    public QaReference {
        Require.notNull("spectrum", spectrum);
    }
}
