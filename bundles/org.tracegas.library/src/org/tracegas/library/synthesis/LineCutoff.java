package org.tracegas.library.synthesis;

/**
 * How far from its centre a line is evaluated: a fixed distance in cm-1 (25 cm-1 is common practice for
 * line-by-line codes, no source) or a number of the line's Voigt half widths.
 */
public final class LineCutoff {

    private final double wavenumbers;
    private final double halfWidths;

    private LineCutoff(double wavenumbers, double halfWidths) {
        this.wavenumbers = wavenumbers;
        this.halfWidths = halfWidths;
    }

    /** Every line evaluated within a fixed distance in cm-1 of its centre. */
    public static LineCutoff wavenumbers(double distance) {
        if (!(distance > 0 && Double.isFinite(distance))) {
            throw new IllegalArgumentException("cut-off distance must be positive and finite, was " + distance);
        }
        return new LineCutoff(distance, Double.POSITIVE_INFINITY);
    }

    /** Every line evaluated within a number of its Voigt half widths of its centre. */
    public static LineCutoff halfWidths(double count) {
        if (!(count > 0 && Double.isFinite(count))) {
            throw new IllegalArgumentException("half width count must be positive and finite, was " + count);
        }
        return new LineCutoff(Double.POSITIVE_INFINITY, count);
    }

    /** The common default: 25 cm-1. */
    public static LineCutoff standard() {
        return wavenumbers(25.0);
    }

    /** The distance in cm-1 for a line of the given Voigt half width. */
    public double distance(double voigtHalfWidth) {
        return Math.min(wavenumbers, halfWidths * voigtHalfWidth);
    }

    @Override
    public String toString() {
        return Double.isInfinite(halfWidths) ? wavenumbers + " cm-1" : halfWidths + " half widths";
    }
}
