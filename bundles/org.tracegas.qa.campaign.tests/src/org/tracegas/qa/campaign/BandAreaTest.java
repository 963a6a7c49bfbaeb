package org.tracegas.qa.campaign;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;
import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;

class BandAreaTest {

    /** A triangle of height h over 2000..2010 cm-1 on a sloping baseline, 1 cm-1 steps. */
    private static Spectrum triangle(double h) {
        double[] v = new double[11];
        for (int i = 0; i <= 10; i++) {
            v[i] = 0.01 + 0.001 * i + h * (1 - Math.abs(i - 5) / 5.0);
        }
        return new Spectrum(SpectralAxis.uniform(AxisUnit.WAVENUMBER, 2000, 1, 11), v, Ordinate.ABSORBANCE);
    }

    @Test
    void areaAboveTheEndPointLineKeepsItsSign() {
        // triangle area = base x height / 2 = 10 x 0.2 / 2 = 1.0 cm-1 (the trapezoid rule is exact on straight
        // pieces); the same band inverted, as with CTS gas in the background, is -1.0, not +1.0
        assertEquals(1.0, BandArea.of(triangle(0.2), 2000, 2010), 1e-12);
        assertEquals(-1.0, BandArea.of(triangle(-0.2), 2000, 2010), 1e-12);
    }
}
