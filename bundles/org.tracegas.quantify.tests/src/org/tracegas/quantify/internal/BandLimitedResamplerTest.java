package org.tracegas.quantify.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class BandLimitedResamplerTest {

    /** A Gaussian line of standard deviation sigma (in samples) centred at c, sampled at 0, 1, 2, ... */
    private static double[] gaussian(int n, double c, double sigma) {
        double[] v = new double[n];
        for (int i = 0; i < n; i++) {
            double d = (i - c) / sigma;
            v[i] = Math.exp(-0.5 * d * d);
        }
        return v;
    }

    /**
     * A Gaussian line of one sample standard deviation (full width 2.4 samples, a line two to three points wide),
     * read midway between samples at its peak. Its Fourier transform exp(-2 pi^2 sigma^2 f^2) is 7e-3 of its peak
     * at the Nyquist frequency, so it is band-limited to that level and the Whittaker-Shannon interpolant (sampling
     * theorem, any signal-processing text; from memory) recovers it to better than 1 % of the peak, where linear
     * interpolation loses 1 - exp(-1/8) = 12 %.
     */
    @Test
    void recoversNarrowPeakBetweenSamples() {
        double[] v = gaussian(200, 100.5, 1.0);
        BandLimitedResampler sinc = new BandLimitedResampler(0, 1, v);
        Resampler linear = new Resampler(java.util.stream.IntStream.range(0, 200).asDoubleStream().toArray(), v);
        assertEquals(1.0, sinc.at(100.5), 0.01);
        assertEquals(1 - Math.exp(-0.125), 1 - linear.at(100.5), 1e-12);
        for (double x = 60; x < 140; x += 0.37) {
            double d = x - 100.5;
            assertEquals(Math.exp(-0.5 * d * d), sinc.at(x), 0.01, "at " + x);
        }
    }

    /** On a sample the interpolant passes through it; on a descending axis it reads the same wavenumbers. */
    @Test
    void passesThroughSamplesOnEitherDirection() {
        double[] v = gaussian(100, 40.3, 2.0);
        double[] reversed = new double[v.length];
        for (int i = 0; i < v.length; i++) {
            reversed[i] = v[v.length - 1 - i];
        }
        BandLimitedResampler up = new BandLimitedResampler(2000, 0.5, v);
        BandLimitedResampler down = new BandLimitedResampler(2049.5, -0.5, reversed);
        assertEquals(v[17], up.at(2008.5), 0);
        assertEquals(up.at(2020.13), down.at(2020.13), 1e-12);
        assertTrue(up.covers(2000) && up.covers(2049.5) && down.covers(2049.5));
        assertFalse(up.covers(1999.9) || down.covers(2049.6));
    }

    /** A constant stays exact everywhere, the ends included (the interpolant is normalised). */
    @Test
    void keepsConstantExactUpToTheEnds() {
        double[] v = new double[50];
        java.util.Arrays.fill(v, 0.37);
        BandLimitedResampler r = new BandLimitedResampler(0, 1, v);
        for (double x = 0; x <= 49; x += 0.29) {
            assertEquals(0.37, r.at(x), 1e-14);
        }
    }
}
