package org.tracegas.preprocess;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.tracegas.spectrum.Spectrum;

class WavenumberShiftTest {

    @Test
    void movesTheBandByTheOffsetOnTheSameAxis() {
        double offset = 0.63;
        Spectrum in = SincResamplerTest.sampled();
        Spectrum out = new WavenumberShift(offset, new SincResampler()).apply(in);
        assertEquals(in.axis(), out.axis());
        for (int i = 100; i < 700; i += 3) {
            double s = out.axis().get(i);
            assertEquals(SincResamplerTest.band(s - offset), out.get(i), 5e-5, "at " + s);
        }
        assertTrue(Double.isNaN(out.get(0)), "no data below the first point");
        assertThrows(IllegalArgumentException.class, () -> new WavenumberShift(Double.NaN, new SincResampler()));
    }
}
