package org.tracegas.preprocess;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;

class SincResamplerTest {

    static final SpectralAxis AXIS = SpectralAxis.uniform(AxisUnit.WAVENUMBER, 1000, 0.5, 801);

    /** A smooth band, about 12 points wide: well inside the band limit of the sampling. */
    static double band(double s) {
        return 0.2 + 0.7 * Math.exp(-Math.pow((s - 1190.3) / 3.5, 2));
    }

    static Spectrum sampled() {
        double[] v = new double[AXIS.size()];
        for (int i = 0; i < v.length; i++) {
            v[i] = band(AXIS.get(i));
        }
        return new Spectrum(AXIS, v, Ordinate.TRANSMITTANCE);
    }

    @Test
    void interpolatesABandLimitedBandBetweenSamples() {
        // Whittaker-Shannon interpolation (sampling theorem): a band sampled finely is recovered between samples
        SpectralAxis target = SpectralAxis.uniform(AxisUnit.WAVENUMBER, 1100.13, 0.37, 400);
        Spectrum out = new SincResampler().resample(sampled(), target);
        // a 16-point Blackman-tapered kernel leaves errors of some 1e-5 of the band height
        for (int i = 0; i < target.size(); i++) {
            assertEquals(band(target.get(i)), out.get(i), 5e-5, "at " + target.get(i));
        }
        assertEquals(Ordinate.TRANSMITTANCE, out.ordinate());
    }

    @Test
    void keepsSamplesOnCommonPointsAndConstantsEverywhere() {
        SpectralAxis target = SpectralAxis.of(AxisUnit.WAVENUMBER, 1000.0, 1000.2, 1200.0, 1399.9, 1400.0, 1400.1);
        Spectrum out = new SincResampler().resample(sampled(), target);
        assertEquals(band(1000.0), out.get(0), 0.0);
        assertEquals(band(1200.0), out.get(2), 0.0);
        assertEquals(band(1400.0), out.get(4), 0.0);
        assertTrue(Double.isNaN(out.get(5)), "outside the source");
        double[] flat = new double[AXIS.size()];
        java.util.Arrays.fill(flat, 0.9);
        Spectrum flatOut = new SincResampler(4).resample(new Spectrum(AXIS, flat, Ordinate.TRANSMITTANCE), target);
        assertEquals(0.9, flatOut.get(1), 1e-15);
        assertEquals(0.9, flatOut.get(3), 1e-15);
    }

    @Test
    void rejectsOtherUnitsAndExplicitSources() {
        SpectralAxis micrometres = SpectralAxis.uniform(AxisUnit.MICROMETRE, 5, 0.1, 3);
        assertThrows(IllegalArgumentException.class, () -> new SincResampler().resample(sampled(), micrometres));
        Spectrum explicit = new Spectrum(SpectralAxis.of(AxisUnit.WAVENUMBER, 1, 2, 4), new double[3],
                Ordinate.TRANSMITTANCE);
        assertThrows(IllegalArgumentException.class, () -> new SincResampler().resample(explicit, AXIS));
        assertThrows(IllegalArgumentException.class, () -> new SincResampler(1));
    }
}
