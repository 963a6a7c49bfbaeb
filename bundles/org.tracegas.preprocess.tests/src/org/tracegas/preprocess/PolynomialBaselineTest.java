package org.tracegas.preprocess;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;

class PolynomialBaselineTest {

    private static final SpectralAxis AXIS = SpectralAxis.uniform(AxisUnit.WAVENUMBER, 2000, 0.25, 2001);

    private static double band(double s) {
        return 0.8 * Math.exp(-Math.pow((s - 2250) / 5.0, 2));
    }

    private static double tilt(double s) {
        double t = (s - 2000) / 500;
        return 0.05 - 0.02 * t + 0.03 * t * t - 0.01 * t * t * t;
    }

    @Test
    void cubicUnderABandIsRemovedExactly() {
        double[] v = new double[AXIS.size()];
        for (int i = 0; i < v.length; i++) {
            double s = AXIS.get(i);
            v[i] = band(s) + tilt(s);
        }
        Spectrum in = new Spectrum(AXIS, v, Ordinate.ABSORBANCE);
        PolynomialBaseline baseline = new PolynomialBaseline(3, List.of(new WavenumberRange(2000, 2150),
                new WavenumberRange(2350, 2500)));
        Spectrum out = baseline.subtract(in);
        for (int i = 0; i < v.length; i += 50) {
            assertEquals(band(AXIS.get(i)), out.get(i), 1e-12, "at " + AXIS.get(i));
        }
        assertEquals(Ordinate.ABSORBANCE, out.ordinate());
    }

    @Test
    void singlePointsAndNaNsAreHandled() {
        double[] v = new double[AXIS.size()];
        for (int i = 0; i < v.length; i++) {
            v[i] = 0.1 + 0.001 * (AXIS.get(i) - 2000);
        }
        v[0] = Double.NaN;
        Spectrum in = new Spectrum(AXIS, v, Ordinate.ABSORBANCE);
        Spectrum out = new PolynomialBaseline(1,
                List.of(new WavenumberRange(2000, 2000), new WavenumberRange(2100.1, 2100.1),
                        new WavenumberRange(2400, 2400))).subtract(in);
        assertEquals(0.0, out.get(1000), 1e-13);
        assertTrue(Double.isNaN(out.get(0)));
    }

    @Test
    void rejectsTooFewPointsNamingTheRegions() {
        Spectrum in = new Spectrum(AXIS, new double[AXIS.size()], Ordinate.ABSORBANCE);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new PolynomialBaseline(2, List.of(new WavenumberRange(2100, 2100.25))).subtract(in));
        assertTrue(e.getMessage().contains("2100.0:2100.25"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> new PolynomialBaseline(11, List.of(new WavenumberRange(1, 2))));
        assertThrows(IllegalArgumentException.class, () -> WavenumberRange.parse("a:b"));
        assertEquals(new WavenumberRange(1.5, 2.5), WavenumberRange.parse(" 1.5:2.5"));
    }
}
