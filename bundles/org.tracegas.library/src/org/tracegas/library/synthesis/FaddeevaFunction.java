package org.tracegas.library.synthesis;

/** The Faddeeva function w(z) = exp(-z^2) erfc(-iz) in the closed upper half plane, z = x + iy, y &gt;= 0. */
public interface FaddeevaFunction {

    /**
     * w(x + iy).
     *
     * @throws IllegalArgumentException if y is negative or an argument is not finite
     */
    ComplexValue value(double x, double y);

    /** Re w(x + iy), the Voigt function K(x, y); implementations may compute it faster than the whole value. */
    default double real(double x, double y) {
        return value(x, y).re();
    }

    /**
     * Accurate w(z) for line-by-line synthesis: Weideman with N = 40 for |z| &lt; 8, the Laplace continued fraction
     * beyond; within a relative 4e-10 of SciPy's wofz and 1.4e-9 of its voigt_profile on their reference grids.
     */
    static FaddeevaFunction standard() {
        return new ContinuedFractionFaddeeva(new WeidemanFaddeeva(40));
    }
}
