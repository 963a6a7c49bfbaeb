package org.tracegas.preprocess;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.function.DoubleUnaryOperator;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.EnumSource;
import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;

class InstrumentLineShapeTest {

    private static final double RESOLUTION = 0.5; // cm-1, so L = 2 cm

    @Test
    void boxcarIsSincWithKnownWidthAndFirstSideLobe() {
        // sinc line shape, from memory: FWHM 1.207 / (2L) = 0.6034 / L, first side lobe -21.7 % of the peak
        // at 2 s L = 1.430 (Griffiths & de Haseth, Fourier Transform Infrared Spectrometry, from memory)
        InstrumentLineShape ils = InstrumentLineShape.forResolution(Apodization.BOXCAR, RESOLUTION);
        double l = ils.maxOpticalPathDifference();
        assertEquals(2.0, l, 0.0);
        double peak = ils.value(0);
        assertEquals(2 * l, peak, 1e-12); // integral of 1 over [-L, L]
        assertEquals(1.207 / (2 * l), fwhm(ils), 0.001 / l);
        double lobe = extremum(ils::value, 0.5 / l, 1.0 / l, false);
        assertEquals(-0.217, lobe / peak, 0.001);
    }

    @Test
    void triangleIsSincSquaredWithKnownWidthAndFirstSideLobe() {
        // sinc^2 line shape, from memory: FWHM 1.772 / (2L) = 0.886 / L, first side lobe +4.7 % of the peak
        InstrumentLineShape ils = InstrumentLineShape.forResolution(Apodization.TRIANGULAR, RESOLUTION);
        double l = ils.maxOpticalPathDifference();
        double peak = ils.value(0);
        assertEquals(l, peak, 1e-12);
        assertEquals(1.772 / (2 * l), fwhm(ils), 0.001 / l);
        double lobe = extremum(ils::value, 1.0 / l, 2.0 / l, true);
        assertEquals(0.047, lobe / peak, 0.001);
    }

    @ParameterizedTest
    @CsvSource({"NORTON_BEER_WEAK, 1.2", "NORTON_BEER_MEDIUM, 1.4", "NORTON_BEER_STRONG, 1.6"})
    void nortonBeerLinesAreTheirDesignFactorWiderThanTheUnapodizedLine(Apodization apodization, double factor) {
        // Norton & Beer, J. Opt. Soc. Am. 66, 259 (1976): weak, medium and strong were chosen for a full width at
        // half maximum 1.2, 1.4 and 1.6 times that of the unapodized line; Naylor & Tahic, J. Opt. Soc. Am. A 24,
        // 3644 (2007) index the family by this ratio with 1.2, 1.4 and 1.6 as the original three. Four figures:
        // the published coefficients have six decimals.
        double box = fwhm(InstrumentLineShape.forResolution(Apodization.BOXCAR, RESOLUTION));
        double apodized = fwhm(InstrumentLineShape.forResolution(apodization, RESOLUTION));
        assertEquals(factor, apodized / box, 5e-4);
    }

    @Test
    void absorbanceIsRefusedBecauseTheInstrumentConvolvesTransmittance() {
        // Beer-Lambert: the ILS acts on the transmitted light; convolving -log10(T) is not the same thing
        // (common practice, no source; EPA FTIR Protocol deresolves by interferogram truncation)
        InstrumentLineShape ils = InstrumentLineShape.forResolution(Apodization.NORTON_BEER_STRONG, RESOLUTION);
        Spectrum absorbance = new Spectrum(SpectralAxis.uniform(AxisUnit.WAVENUMBER, 1000, 0.01, 1000),
                new double[1000], Ordinate.ABSORBANCE);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> ils.apply(absorbance));
        assertTrue(e.getMessage().contains("absorbance"), e.getMessage());
    }

    @ParameterizedTest
    @EnumSource(Apodization.class)
    void deresolvingOnePointGivesTheSampledLineShape(Apodization apodization) {
        // two independent computations: quadrature of the apodization transform against the product in the
        // path difference domain; a unit-area spike of one point (height 1/h) must turn into ILS(offset)
        InstrumentLineShape ils = InstrumentLineShape.forResolution(apodization, RESOLUTION);
        double h = 0.01;
        int n = 4001;
        int centre = n / 2;
        double[] v = new double[n];
        v[centre] = 1.0 / h;
        Spectrum spike = new Spectrum(SpectralAxis.uniform(AxisUnit.WAVENUMBER, 1000.0, h, n), v, Ordinate.ARBITRARY);
        Spectrum out = ils.apply(spike);
        double peak = ils.value(0);
        for (int j = centre - 600; j <= centre + 600; j += 7) {
            assertEquals(ils.value((j - centre) * h), out.get(j), 2e-3 * peak, "offset index " + (j - centre));
        }
        assertEquals(spike.axis(), out.axis());
    }

    @Test
    void flatTransmittanceStaysFlatAndAreaOfALineIsKept() {
        // the ILS has unit area (A(0) = 1), so convolution keeps a flat level and the area of an absorption dip
        InstrumentLineShape ils = InstrumentLineShape.forResolution(Apodization.NORTON_BEER_MEDIUM, 1.0);
        double h = 0.02;
        int n = 5000;
        double[] t = new double[n];
        double dipArea = 0;
        for (int i = 0; i < n; i++) {
            double s = 1000 + i * h;
            double dip = 0.3 * Math.exp(-Math.pow((s - 1050) / 0.05, 2));
            t[i] = 1.0 - dip;
            dipArea += dip * h;
        }
        Spectrum out = ils.apply(new Spectrum(SpectralAxis.uniform(AxisUnit.WAVENUMBER, 1000, h, n), t,
                Ordinate.TRANSMITTANCE));
        // far from the line only the side lobes of the ILS remain (c0 = 0.15 step at L: decay as 1/offset)
        assertEquals(1.0, out.get(10), 1e-4);
        double[] flat = new double[n];
        java.util.Arrays.fill(flat, 0.8);
        Spectrum flatOut = ils.apply(new Spectrum(out.axis(), flat, Ordinate.TRANSMITTANCE));
        for (int i = 0; i < n; i += 97) {
            assertEquals(0.8, flatOut.get(i), 1e-12, "flat level at index " + i);
        }
        double outArea = 0;
        for (int i = 0; i < n; i++) {
            outArea += (1.0 - out.get(i)) * h;
        }
        // side lobes reaching beyond the 100 cm-1 range take a little area away
        assertEquals(dipArea, outArea, 1e-3 * dipArea);
        assertTrue(1.0 - out.get(out.axis().nearestIndex(1050)) < 0.3 * 0.5, "line is broadened and lower");
    }

    @Test
    void rejectsCoarseOrNonUniformSpectraAndBadResolution() {
        InstrumentLineShape ils = InstrumentLineShape.forResolution(Apodization.BOXCAR, 0.5);
        Spectrum coarse = new Spectrum(SpectralAxis.uniform(AxisUnit.WAVENUMBER, 1000, 0.5, 10), new double[10],
                Ordinate.TRANSMITTANCE);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> ils.apply(coarse));
        assertTrue(e.getMessage().contains("too coarse"), e.getMessage());
        Spectrum explicit = new Spectrum(SpectralAxis.of(AxisUnit.WAVENUMBER, 1, 2, 4), new double[3],
                Ordinate.TRANSMITTANCE);
        assertThrows(IllegalArgumentException.class, () -> ils.apply(explicit));
        assertThrows(IllegalArgumentException.class, () -> InstrumentLineShape.forResolution(Apodization.BOXCAR, 0));
        assertThrows(IllegalArgumentException.class, () -> InstrumentLineShape.forResolution(null, 1));
    }

    private static double fwhm(InstrumentLineShape ils) {
        double half = 0.5 * ils.value(0);
        double lo = 0;
        double hi = 1.0 / ils.maxOpticalPathDifference();
        for (int i = 0; i < 80; i++) {
            double mid = 0.5 * (lo + hi);
            if (ils.value(mid) > half) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return 2 * lo;
    }

    /** Golden-section search for the maximum (or minimum) of f on [a, b]. */
    private static double extremum(DoubleUnaryOperator f, double a, double b, boolean maximum) {
        double g = (Math.sqrt(5) - 1) / 2;
        double sign = maximum ? 1 : -1;
        for (int i = 0; i < 100; i++) {
            double c = b - g * (b - a);
            double d = a + g * (b - a);
            if (sign * f.applyAsDouble(c) > sign * f.applyAsDouble(d)) {
                b = d;
            } else {
                a = c;
            }
        }
        return f.applyAsDouble(0.5 * (a + b));
    }
}
