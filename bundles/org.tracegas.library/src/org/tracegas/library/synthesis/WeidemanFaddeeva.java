package org.tracegas.library.synthesis;

/**
 * w(z) by the rational expansion of J.A.C. Weideman, "Computation of the complex error function", SIAM J.
 * Numer. Anal. 31 (1994) 1497-1518: w(z) = 2 p(Z) / (L - iz)^2 + 1 / (sqrt(pi) (L - iz)), Z = (L + iz) / (L - iz),
 * p a polynomial of degree N - 1 whose coefficients are computed once from a discrete cosine sum, L =
 * sqrt(N / sqrt 2).
 * <p>
 * Accuracy against SciPy's {@code wofz} and {@code voigt_profile}, relative, in each of the real and imaginary
 * parts, on the SciPy reference grids: with N = 32 about 2.6e-7 on the wofz grid, worst near the real axis where
 * Re w is a small part of |w|, and 1.5e-6 on the Voigt grid (real part at x = 21, y = 7e-7), so N = 32 alone
 * misses a relative 1e-6. With N = 40: 3.8e-10 on the wofz grid, 1.4e-9 on the Voigt grid. Beyond |z| = 8
 * {@link ContinuedFractionFaddeeva} is both more accurate and cheaper. Humlicek's W4 (1982) was not used
 * because it reaches only about 1e-4.
 */
public final class WeidemanFaddeeva implements FaddeevaFunction {

    private static final double INV_SQRT_PI = 1.0 / Math.sqrt(Math.PI);

    private final int n;
    private final double l;
    private final double[] a; // a[k] multiplies Z^(k-1), k = 1..n

    /** @param n number of terms N, at least 8 (see the class comment for the accuracy) */
    public WeidemanFaddeeva(int n) {
        if (n < 8) {
            throw new IllegalArgumentException("n must be at least 8, was " + n);
        }
        this.n = n;
        this.l = Math.sqrt(n / Math.sqrt(2.0));
        this.a = coefficients(n, l);
    }

    /**
     * a_k = (1 / 2M) sum over j = -M+1 .. M-1 of f(t_j) cos(pi k j / M), M = 2N, t_j = L tan(pi j / 2M),
     * f(t) = exp(-t^2) (L^2 + t^2): the FFT of Weideman's paper written out as the real cosine sum it is, f
     * being even.
     */
    private static double[] coefficients(int n, double l) {
        int m = 2 * n;
        double[] f = new double[m];
        for (int j = 0; j < m; j++) {
            double t = l * Math.tan(j * Math.PI / (2.0 * m));
            f[j] = Math.exp(-t * t) * (l * l + t * t);
        }
        double[] coefficients = new double[n + 1];
        for (int k = 1; k <= n; k++) {
            double sum = f[0];
            for (int j = 1; j < m; j++) {
                sum += 2.0 * f[j] * Math.cos(Math.PI * k * j / m);
            }
            coefficients[k] = sum / (2.0 * m);
        }
        return coefficients;
    }

    public int terms() {
        return n;
    }

    @Override
    public ComplexValue value(double x, double y) {
        if (!(y >= 0) || !Double.isFinite(x) || !Double.isFinite(y)) {
            throw new IllegalArgumentException("w(z) needs finite x and y >= 0, was x = " + x + ", y = " + y);
        }
        // L - iz = (L + y) - ix and L + iz = (L - y) + ix
        double dr = l + y;
        double di = -x;
        double d2 = dr * dr + di * di;
        double ir = dr / d2; // 1 / (L - iz)
        double ii = -di / d2;
        double nr = l - y;
        double zr = nr * ir - x * ii; // Z = (L + iz) / (L - iz)
        double zi = nr * ii + x * ir;
        double pr = a[n];
        double pi = 0.0;
        for (int k = n - 1; k >= 1; k--) {
            double t = pr * zr - pi * zi + a[k];
            pi = pr * zi + pi * zr;
            pr = t;
        }
        double i2r = ir * ir - ii * ii;
        double i2i = 2.0 * ir * ii;
        return new ComplexValue(2.0 * (pr * i2r - pi * i2i) + INV_SQRT_PI * ir,
                2.0 * (pr * i2i + pi * i2r) + INV_SQRT_PI * ii);
    }
}
