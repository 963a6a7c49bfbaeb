package org.tracegas.spectrum;

import java.util.Arrays;

/** Immutable spectrum: an axis, one value per axis point and what the values mean. */
public final class Spectrum {

    private final SpectralAxis axis;
    private final double[] values;
    private final Ordinate ordinate;

    /**
     * @throws IllegalArgumentException if an argument is null or the value count differs from the axis size
     */
    public Spectrum(SpectralAxis axis, double[] values, Ordinate ordinate) {
        if (axis == null) {
            throw new IllegalArgumentException("axis must not be null");
        }
        if (values == null) {
            throw new IllegalArgumentException("values must not be null");
        }
        if (ordinate == null) {
            throw new IllegalArgumentException("ordinate must not be null");
        }
        if (values.length != axis.size()) {
            throw new IllegalArgumentException(
                    "values has " + values.length + " points but the axis has " + axis.size());
        }
        this.axis = axis;
        this.values = values.clone();
        this.ordinate = ordinate;
    }

    public SpectralAxis axis() {
        return axis;
    }

    public Ordinate ordinate() {
        return ordinate;
    }

    public int size() {
        return values.length;
    }

    public double get(int index) {
        return values[index];
    }

    /** A copy of the values. */
    public double[] toArray() {
        return values.clone();
    }

    /** The same axis with other values. */
    public Spectrum withValues(double[] newValues, Ordinate newOrdinate) {
        return new Spectrum(axis, newValues, newOrdinate);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Spectrum s && ordinate == s.ordinate && axis.equals(s.axis)
                && Arrays.equals(values, s.values);
    }

    @Override
    public int hashCode() {
        return 31 * axis.hashCode() + Arrays.hashCode(values);
    }

    @Override
    public String toString() {
        return "Spectrum[" + ordinate + ", " + axis + "]";
    }
}
