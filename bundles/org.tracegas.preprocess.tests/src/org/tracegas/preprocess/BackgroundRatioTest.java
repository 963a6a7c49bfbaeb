package org.tracegas.preprocess;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Duration;
import java.time.Instant;

import org.junit.jupiter.api.Test;
import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;

class BackgroundRatioTest {

    private static final SpectralAxis AXIS = SpectralAxis.uniform(AxisUnit.WAVENUMBER, 1000, 0.5, 4);
    private static final Instant T0 = Instant.parse("2026-03-01T06:00:00Z");
    private static final Background BACKGROUND = new Background("bg-2026-03-01-0600", T0,
            new Spectrum(AXIS, new double[] {2.0, 4.0, 5.0, 0.0}, Ordinate.SINGLE_BEAM));

    @Test
    void absorbanceIsMinusDecadicLogOfTheRatio() {
        // Beer-Lambert decadic absorbance A = -log10(I / I0) (IUPAC Gold Book)
        Spectrum sample = new Spectrum(AXIS, new double[] {1.0, 0.4, -0.1, 1.0}, Ordinate.SINGLE_BEAM);
        RatioResult r = new BackgroundRatio().absorbance(sample, T0.plus(Duration.ofHours(3)), BACKGROUND);
        assertEquals(Ordinate.ABSORBANCE, r.spectrum().ordinate());
        assertEquals(Math.log10(2.0), r.spectrum().get(0), 1e-15);
        assertEquals(1.0, r.spectrum().get(1), 1e-15);
        assertTrue(Double.isNaN(r.spectrum().get(2)), "negative ratio has no absorbance");
        assertTrue(Double.isNaN(r.spectrum().get(3)), "zero background has no absorbance");
        assertEquals("bg-2026-03-01-0600", r.backgroundId());
        assertEquals(Duration.ofHours(3), r.backgroundAge());
        assertFalse(r.backgroundTooOld());
    }

    @Test
    void transmittanceIsTheRatioAndOldBackgroundsAreFlagged() {
        Spectrum sample = new Spectrum(AXIS, new double[] {1.0, 1.0, 1.0, 1.0}, Ordinate.SINGLE_BEAM);
        // default limit 24 h: common practice, a background is taken once a day
        RatioResult r = new BackgroundRatio().transmittance(sample, T0.plus(Duration.ofHours(25)), BACKGROUND);
        assertEquals(Ordinate.TRANSMITTANCE, r.spectrum().ordinate());
        assertEquals(0.25, r.spectrum().get(1), 0.0);
        assertTrue(r.backgroundTooOld());
        assertFalse(new BackgroundRatio().transmittance(sample, T0.plus(Duration.ofHours(24)), BACKGROUND)
                .backgroundTooOld(), "exactly at the limit is not too old");
        RatioResult strict = new BackgroundRatio(Duration.ofHours(2)).transmittance(sample,
                T0.minus(Duration.ofHours(3)), BACKGROUND);
        assertEquals(Duration.ofHours(-3), strict.backgroundAge());
        assertTrue(strict.backgroundTooOld());
    }

    @Test
    void rejectsOtherAxesAndOrdinates() {
        Spectrum otherAxis = new Spectrum(SpectralAxis.uniform(AxisUnit.WAVENUMBER, 1000, 0.25, 4), new double[4],
                Ordinate.SINGLE_BEAM);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new BackgroundRatio().absorbance(otherAxis, T0, BACKGROUND));
        assertTrue(e.getMessage().contains("bg-2026-03-01-0600"), e.getMessage());
        Spectrum absorbance = new Spectrum(AXIS, new double[4], Ordinate.ABSORBANCE);
        assertThrows(IllegalArgumentException.class, () -> new BackgroundRatio().absorbance(absorbance, T0, BACKGROUND));
        assertThrows(IllegalArgumentException.class, () -> new Background("bg", T0, absorbance));
        assertThrows(IllegalArgumentException.class, () -> new BackgroundRatio(Duration.ZERO));
    }
}
