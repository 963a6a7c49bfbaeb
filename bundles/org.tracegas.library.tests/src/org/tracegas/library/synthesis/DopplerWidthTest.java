package org.tracegas.library.synthesis;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class DopplerWidthTest {

    /**
     * CO at 2143 cm-1 and 296 K, molar mass 28.0101 g/mol (from memory): HWHM = v/c sqrt(2 ln2 kT/m) computed here
     * from CODATA 2018 constants (k = 1.380649e-23 J/K, c = 299792458 m/s, N_A = 6.02214076e23 /mol, all exact)
     * gives 0.002495 cm-1; the handbook shortcut HWHM = 3.581e-7 v sqrt(T/M) (from memory) agrees to its four
     * digits.
     */
    @Test
    void coFundamentalAtRoomTemperature() {
        double k = 1.380649e-23;
        double c = 299_792_458.0;
        double mass = 28.0101e-3 / 6.02214076e23;
        double expected = 2143.0 / c * Math.sqrt(2.0 * Math.log(2.0) * k * 296.0 / mass);
        double hwhm = DopplerWidth.halfWidth(2143.0, 296.0, 28.0101);
        assertEquals(expected, hwhm, 1e-12 * expected);
        assertEquals(0.002495, hwhm, 0.000001);
        assertEquals(3.581e-7 * 2143.0 * Math.sqrt(296.0 / 28.0101), hwhm, 2e-4 * hwhm);
    }

    /** The Gaussian standard deviation is HWHM / sqrt(2 ln 2) (definition of the normal distribution). */
    @Test
    void sigmaIsTheStandardDeviationOfTheSameGaussian() {
        double sigma = DopplerWidth.sigma(1000.0, 400.0, 16.04);
        assertEquals(DopplerWidth.halfWidth(1000.0, 400.0, 16.04) / Math.sqrt(2 * Math.log(2)), sigma, 1e-18);
    }
}
