package org.tracegas.spectrum;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

class SpectrumTest {

    @Test
    void valuesAreCopiedSoTheSpectrumStaysImmutable() {
        double[] v = { 1, 2, 3 };
        Spectrum s = new Spectrum(SpectralAxis.uniform(AxisUnit.WAVENUMBER, 1000, 1, 3), v, Ordinate.ABSORBANCE);
        v[0] = 99;
        s.toArray()[1] = 99;
        assertEquals(1, s.get(0));
        assertEquals(2, s.get(1));
    }

    @Test
    void valueCountMustMatchAxis() {
        assertThrows(IllegalArgumentException.class, () -> new Spectrum(
                SpectralAxis.uniform(AxisUnit.WAVENUMBER, 1000, 1, 3), new double[2], Ordinate.ABSORBANCE));
    }

    @Test
    void interferogramSpacingFollowsTheLaser() {
        Interferogram igm = new Interferogram(new double[8], 15798.0, 2);
        assertEquals(2 / 15798.0, igm.sampleSpacingCm(), 1e-15);
        assertEquals(15798.0 / 4, igm.nyquistWavenumber(), 1e-9);
    }
}
