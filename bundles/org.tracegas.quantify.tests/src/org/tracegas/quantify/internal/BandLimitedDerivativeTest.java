package org.tracegas.quantify.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class BandLimitedDerivativeTest {

    /**
     * A Gaussian line of standard deviation 0.6 sampled every 0.5 (about three points per half width, band-limited
     * to 1e-3) on a sloping baseline: derivatives within 0.2 % of the largest analytic derivative
     * (d/dx exp(-u^2/2) = -u/s exp(-u^2/2), d2/dx2 = (u^2-1)/s^2 exp(-u^2/2), calculus). A Lorentzian sampled
     * this coarsely is not band-limited and would test aliasing rather than the filter.
     */
    @Test
    void matchesAnalyticDerivativesOfANarrowLine() {
        double s = 0.6;
        double h = 0.5;
        int n = 401;
        double[] f = new double[n];
        double[] f1 = new double[n];
        double[] f2 = new double[n];
        for (int i = 0; i < n; i++) {
            double u = ((i - 200) * h - 0.13) / s;
            double e = Math.exp(-u * u / 2);
            f[i] = e + 0.2 + 0.001 * i;
            f1[i] = -u / s * e + 0.001 / h;
            f2[i] = (u * u - 1) / (s * s) * e;
        }
        double[] d1 = BandLimitedDerivative.of(f, h, 1);
        double[] d2 = BandLimitedDerivative.of(f, h, 2);
        for (int i = 100; i <= 300; i++) {
            assertEquals(f1[i], d1[i], 0.002 * 0.61 / s, "first derivative at " + i);
            assertEquals(f2[i], d2[i], 0.002 / (s * s), "second derivative at " + i);
        }
    }

    @Test
    void straightLineHasItsSlopeAndNoCurvature() {
        double[] f = new double[200];
        for (int i = 0; i < f.length; i++) {
            f[i] = 3 - 0.25 * i;
        }
        double[] d1 = BandLimitedDerivative.of(f, -0.5, 1);
        double[] d2 = BandLimitedDerivative.of(f, -0.5, 2);
        for (int i = 0; i < f.length; i++) {
            assertEquals(0.5, d1[i], 1e-12);
            assertEquals(0, d2[i], 1e-10);
        }
    }
}
