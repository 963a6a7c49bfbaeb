package org.tracegas.quantify;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;

class SampleTest {

    private static final Spectrum ABSORBANCE = new Spectrum(SpectralAxis.uniform(AxisUnit.WAVENUMBER, 2000, 1, 3),
            new double[] {0.1, 0.2, 0.1}, Ordinate.ABSORBANCE);

    @Test
    void carriesTheCellConditionsItIsGiven() {
        Sample plain = new Sample(ABSORBANCE, null, 1.4);
        assertTrue(Double.isNaN(plain.cellTemperature()) && Double.isNaN(plain.cellPressure()));
        Sample hot = plain.inCell(470, 97);
        assertEquals(470, hot.cellTemperature());
        assertEquals(97, hot.cellPressure());
        assertEquals(1.4, hot.noiseCorrelation());
        assertSame(ABSORBANCE, hot.absorbance());
    }

    @Test
    void refusesConditionsNoCellHas() {
        Sample s = Sample.of(ABSORBANCE);
        assertMessage("numbers", () -> s.inCell(Double.NaN, 97));
        assertMessage("cellTemperature", () -> s.inCell(0, 97));
        assertMessage("cellPressure", () -> s.inCell(300, Double.POSITIVE_INFINITY));
    }

    private static void assertMessage(String part, org.junit.jupiter.api.function.Executable build) {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, build);
        assertTrue(e.getMessage().contains(part), e.getMessage());
    }
}
