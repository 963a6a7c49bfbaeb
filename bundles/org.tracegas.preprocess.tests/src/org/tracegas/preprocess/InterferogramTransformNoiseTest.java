package org.tracegas.preprocess;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.tracegas.spectrum.Interferogram;
import org.tracegas.spectrum.Spectrum;

/**
 * Coverage of least-squares uncertainties when detector noise goes through the real interferogram transform:
 * apodization and zero filling correlate the noise of neighbouring spectral points, which a fit that takes them
 * as independent does not see. The truth is the known amplitude of the noise-free spectrum and the empirical
 * distribution of 1000 draws, not the factor's formula.
 */
class InterferogramTransformNoiseTest {

    private static final int SAMPLES = 2048;
    private static final int DRAWS = 1000;
    /** Two-sided 95 % point of the normal distribution (any statistics table). */
    private static final double Z95 = 1.959964;

    /** A smooth continuum 1500..2500 cm-1 (Gaussian envelope of cosines 2 cm-1 apart, well below the resolution). */
    private static double[] continuum(int zpd) {
        double dx = SyntheticInterferogram.INTERVAL / SyntheticInterferogram.LASER;
        double[] x = new double[SAMPLES];
        for (double s = 1500; s <= 2500; s += 2) {
            double a = 0.05 * Math.exp(-0.5 * Math.pow((s - 2000) / 200, 2));
            for (int i = 0; i < SAMPLES; i++) {
                x[i] += a * Math.cos(2 * Math.PI * s * (i - zpd) * dx);
            }
        }
        return x;
    }

    /**
     * Double- and single-sided recordings with Mertz phase correction (the single-sided ones with the Mertz ramp
     * over 160 samples before ZPD); the fitted amplitude c of the noise-free spectrum over 1800..2200 cm-1 is 1 by
     * construction.
     */
    @ParameterizedTest
    @CsvSource({"BOXCAR, 1, DOUBLE_SIDED", "BOXCAR, 2, DOUBLE_SIDED", "NORTON_BEER_MEDIUM, 1, DOUBLE_SIDED",
            "NORTON_BEER_MEDIUM, 2, DOUBLE_SIDED", "HAPP_GENZEL, 4, DOUBLE_SIDED", "NORTON_BEER_MEDIUM, 2, SINGLE_SIDED",
            "BOXCAR, 1, SINGLE_SIDED"})
    void inflatedUncertaintyCoversTheTruthNinetyFivePercentOfTheTime(Apodization apodization, int zeroFill,
            Sidedness sidedness) {
        int zpd = sidedness == Sidedness.DOUBLE_SIDED ? SAMPLES / 2 : 160;
        double[] clean = continuum(zpd);
        InterferogramTransform transform = new InterferogramTransform(TransformSettings.defaults()
                .withSidedness(sidedness).withApodization(apodization).withZeroFillFactor(zeroFill));
        Interferogram noiseFree = new Interferogram(clean, SyntheticInterferogram.LASER,
                SyntheticInterferogram.INTERVAL);
        Spectrum model = transform.singleBeam(noiseFree);
        double factor = transform.noiseVarianceFactor(noiseFree);
        int lo = model.axis().nearestIndex(1800);
        int hi = model.axis().nearestIndex(2200);
        double mm = 0;
        for (int k = lo; k <= hi; k++) {
            mm += model.get(k) * model.get(k);
        }
        Random rnd = new Random(5);
        int naiveHits = 0;
        int inflatedHits = 0;
        double[] noisy = new double[SAMPLES];
        for (int draw = 0; draw < DRAWS; draw++) {
            for (int i = 0; i < SAMPLES; i++) {
                noisy[i] = clean[i] + 0.002 * rnd.nextGaussian();
            }
            Spectrum y = transform.singleBeam(new Interferogram(noisy, SyntheticInterferogram.LASER,
                    SyntheticInterferogram.INTERVAL));
            double my = 0;
            for (int k = lo; k <= hi; k++) {
                my += model.get(k) * y.get(k);
            }
            double c = my / mm;
            double rss = 0;
            for (int k = lo; k <= hi; k++) {
                double r = y.get(k) - c * model.get(k);
                rss += r * r;
            }
            double naive = Math.sqrt(rss / (hi - lo) / mm);
            naiveHits += Math.abs(c - 1) <= Z95 * naive ? 1 : 0;
            inflatedHits += Math.abs(c - 1) <= Z95 * naive * Math.sqrt(factor) ? 1 : 0;
        }
        double naiveCoverage = 100.0 * naiveHits / DRAWS;
        double coverage = 100.0 * inflatedHits / DRAWS;
        String figures = apodization + ", zero fill " + zeroFill + ", " + sidedness + ": F = " + factor + ", naive coverage "
                + naiveCoverage + " %, with sqrt(F) " + coverage + " %";
        assertTrue(coverage >= 93 && coverage <= 97, figures);
        if (factor > 1.5) {
            assertTrue(naiveCoverage < 90, figures);
        }
    }

    @ParameterizedTest
    @CsvSource({"BOXCAR, 1, 1", "BOXCAR, 2, 2", "TRIANGULAR, 1, 3", "TRIANGULAR, 2, 6"})
    void factorIsTheZeroFillOverTheMeanSquareWeight(Apodization apodization, int zeroFill, double expected) {
        // equivalent width of the noise autocorrelation: for a double-sided recording of 2n + 1 = 2047 samples
        // into 2048 zero fill points the factor is ZF / mean(w^2), mean(w^2) = 1 (boxcar), 1/3 (triangle,
        // integral of (1 - x)^2 over [0, 1]); the discrete sums differ by about 1/n
        double[] x = continuum(SAMPLES / 2);
        InterferogramTransform t = new InterferogramTransform(TransformSettings.defaults()
                .withSidedness(Sidedness.DOUBLE_SIDED).withApodization(apodization).withZeroFillFactor(zeroFill));
        double f = t.noiseVarianceFactor(new Interferogram(x, SyntheticInterferogram.LASER,
                SyntheticInterferogram.INTERVAL));
        assertEquals(expected, f, 0.01 * expected);
    }
}
