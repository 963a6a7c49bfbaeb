package org.tracegas.library.synthesis;

/**
 * An immutable complex number, as returned by {@link FaddeevaFunction}; only what the line shapes need.
 *
 * @param re real part
 * @param im imaginary part
 */
public record ComplexValue(double re, double im) {

    /** |this - other| / |other|, the relative distance to a reference value. */
    public double relativeDistance(ComplexValue other) {
        return Math.hypot(re - other.re, im - other.im) / Math.hypot(other.re, other.im);
    }
}
