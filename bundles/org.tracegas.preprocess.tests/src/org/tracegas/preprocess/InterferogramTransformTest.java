package org.tracegas.preprocess;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;
import org.tracegas.spectrum.Interferogram;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.Spectrum;

class InterferogramTransformTest {

    private static final double[] LINES = {1000.3, 1.0, 2000.7, 0.4, 3000.1, 0.7};

    @ParameterizedTest
    @EnumSource(Sidedness.class)
    void cosineLinesAppearAtTheirWavenumbersWithAreasInTheRatioOfTheirAmplitudes(Sidedness sidedness) {
        // Fourier transform of a cosine (textbook): a cos(2 pi s0 x) gives a line of area a/2 at s0
        int zpd = sidedness == Sidedness.SINGLE_SIDED ? 300 : 4096;
        double dx = SyntheticInterferogram.INTERVAL / SyntheticInterferogram.LASER;
        Interferogram ifg = SyntheticInterferogram.of(8192, zpd, 0.3 * dx, 5.0, LINES);
        Spectrum s = new InterferogramTransform(TransformSettings.defaults().withSidedness(sidedness))
                .singleBeam(ifg);
        assertEquals(Ordinate.SINGLE_BEAM, s.ordinate());
        double step = s.axis().step();
        double area1 = checkLine(s, LINES[0], step);
        for (int l = 2; l < LINES.length; l += 2) {
            double area = checkLine(s, LINES[l], step);
            assertEquals(LINES[l + 1] / LINES[1], area / area1, 0.01 * LINES[l + 1] / LINES[1], "area ratio");
        }
        assertEquals(LINES[1] / 2, area1, 0.01 * LINES[1] / 2, "area of the first line");
    }

    @Test
    void axisStepFollowsLaserWavenumberSamplingIntervalAndTransformLength() {
        // spectral point spacing 1 / (N dx), dx = sampling interval / laser wavenumber (definition of the DFT)
        Interferogram ifg = SyntheticInterferogram.of(4096, 100, 0, 0, LINES);
        for (int zeroFill : new int[] {1, 2, 4}) {
            Spectrum s = new InterferogramTransform(TransformSettings.defaults().withZeroFillFactor(zeroFill))
                    .singleBeam(ifg);
            int transformLength = 4096 * zeroFill;
            assertEquals(1.0 / (transformLength * ifg.sampleSpacingCm()), s.axis().step(), 1e-12);
            assertEquals(transformLength / 2 + 1, s.size());
            assertEquals(0.0, s.axis().first(), 0.0);
        }
    }

    @Test
    void magnitudeAndMertzAgreeForNoiselessDoubleSidedLines() {
        // double-sided: the spectrum is B exp(i phase), so |X| = B; a single-sided magnitude would not be
        Interferogram ifg = SyntheticInterferogram.of(8192, 4096, 1e-5, 0, LINES);
        TransformSettings doubleSided = TransformSettings.defaults().withSidedness(Sidedness.DOUBLE_SIDED);
        Spectrum mertz = new InterferogramTransform(doubleSided).singleBeam(ifg);
        Spectrum magnitude = new InterferogramTransform(
                doubleSided.withPhaseCorrection(PhaseCorrection.MAGNITUDE)).singleBeam(ifg);
        int peak = mertz.axis().nearestIndex(LINES[0]);
        assertEquals(magnitude.get(peak), mertz.get(peak), 1e-3 * magnitude.get(peak));
    }

    @Test
    void rangeKeepsTheSameValuesOnAShorterAxis() {
        Interferogram ifg = SyntheticInterferogram.of(4096, 200, 0, 1, LINES);
        Spectrum full = new InterferogramTransform(TransformSettings.defaults()).singleBeam(ifg);
        Spectrum part = new InterferogramTransform(TransformSettings.defaults().withRange(900, 3100)).singleBeam(ifg);
        assertTrue(part.axis().first() >= 900 && part.axis().first() - 900 < part.axis().step());
        assertTrue(part.axis().last() <= 3100 && 3100 - part.axis().last() < part.axis().step());
        int offset = full.axis().nearestIndex(part.axis().first());
        for (int i = 0; i < part.size(); i++) {
            assertEquals(full.get(offset + i), part.get(i), 0.0);
        }
    }

    @Test
    void reusedTransformGivesIdenticalResultsAcrossLengths() {
        InterferogramTransform t = new InterferogramTransform(TransformSettings.defaults());
        Interferogram a = SyntheticInterferogram.of(4096, 200, 0, 1, LINES);
        Interferogram b = SyntheticInterferogram.of(2048, 150, 0, 1, LINES);
        Spectrum first = t.singleBeam(a);
        t.singleBeam(b);
        Spectrum again = t.singleBeam(a);
        assertArrayEquals(first.toArray(), again.toArray(), 0.0);
        assertEquals(first, new InterferogramTransform(TransformSettings.defaults()).singleBeam(a));
    }

    /** A transform for another thread gives the same spectrum and noise factor bit for bit as the one used. */
    @Test
    void transformWithOwnBuffersGivesIdenticalResults() {
        InterferogramTransform used = new InterferogramTransform(TransformSettings.defaults(), FftEngine.COMMONS_MATH);
        Interferogram a = SyntheticInterferogram.of(4096, 200, 0, 1, LINES);
        used.singleBeam(SyntheticInterferogram.of(2048, 150, 0, 1, LINES));
        InterferogramTransform own = used.withOwnBuffers();
        assertEquals(used.settings(), own.settings());
        assertEquals(used.singleBeam(a), own.singleBeam(a));
        assertEquals(Double.doubleToRawLongBits(used.noiseVarianceFactor(a)),
                Double.doubleToRawLongBits(own.noiseVarianceFactor(a)));
    }

    @Test
    void recordingReversedInPathDifferenceGivesTheSameSingleBeam() {
        // a reversed interferogram has the complex conjugate spectrum; the Mertz phase removes either phase
        double dx = SyntheticInterferogram.INTERVAL / SyntheticInterferogram.LASER;
        Interferogram forward = SyntheticInterferogram.of(4096, 200, 0.2 * dx, 1, LINES);
        double[] x = forward.toArray();
        double[] reversed = new double[x.length];
        for (int i = 0; i < x.length; i++) {
            reversed[i] = x[x.length - 1 - i];
        }
        InterferogramTransform t = new InterferogramTransform(TransformSettings.defaults());
        Spectrum a = t.singleBeam(forward);
        Spectrum b = t.singleBeam(new Interferogram(reversed, forward.laserWavenumber(), forward.samplingInterval()));
        int peak = a.axis().nearestIndex(LINES[0]);
        for (int i = 0; i < a.size(); i++) {
            assertEquals(a.get(i), b.get(i), 1e-9 * a.get(peak), "point " + i);
        }
    }

    @Test
    void burstCentreFindsTheSameZpdForASymmetricBurst() {
        Interferogram ifg = SyntheticInterferogram.of(4096, 200, 0, 1, LINES);
        Spectrum largest = new InterferogramTransform(TransformSettings.defaults()).singleBeam(ifg);
        Spectrum centre = new InterferogramTransform(TransformSettings.defaults().withZpdSearch(ZpdSearch.BURST_CENTRE))
                .singleBeam(ifg);
        assertEquals(largest, centre);
    }

    @Test
    void mertzNeedsPointsBeforeZpd() {
        Interferogram ifg = SyntheticInterferogram.of(1024, 3, 0, 0, LINES);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new InterferogramTransform(TransformSettings.defaults()).singleBeam(ifg));
        assertTrue(e.getMessage().contains("ZPD at sample 3"), e.getMessage());
        Spectrum magnitude = new InterferogramTransform(
                TransformSettings.defaults().withPhaseCorrection(PhaseCorrection.MAGNITUDE)).singleBeam(ifg);
        assertTrue(magnitude.get(magnitude.axis().nearestIndex(LINES[0])) > 0);
    }

    @Test
    void settingsRejectOutOfRangeFields() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> TransformSettings.defaults().withZeroFillFactor(3));
        assertTrue(e.getMessage().contains("zeroFillFactor"));
        assertThrows(IllegalArgumentException.class, () -> TransformSettings.defaults().withPhasePoints(15));
        assertThrows(IllegalArgumentException.class, () -> TransformSettings.defaults().withRange(100, 50));
        Interferogram ifg = SyntheticInterferogram.of(1024, 100, 0, 0, LINES);
        assertThrows(IllegalArgumentException.class,
                () -> new InterferogramTransform(TransformSettings.defaults().withRange(5000, 6000)).singleBeam(ifg));
    }

    /** Checks the line position (parabola through the 3 top points) and returns its area over +-30 points. */
    private static double checkLine(Spectrum s, double wavenumber, double step) {
        int i = s.axis().nearestIndex(wavenumber);
        for (int j = i - 3; j <= i + 3; j++) {
            if (s.get(j) > s.get(i)) {
                i = j;
            }
        }
        double a = s.get(i - 1);
        double b = s.get(i);
        double c = s.get(i + 1);
        double centre = s.axis().get(i) + 0.5 * (a - c) / (a - 2 * b + c) * step;
        assertEquals(wavenumber, centre, 0.1 * step, "line position");
        double area = 0;
        for (int j = i - 30; j <= i + 30; j++) {
            area += s.get(j) * step;
        }
        return area;
    }
}
