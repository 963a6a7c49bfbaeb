package org.tracegas.spectrum;

import java.util.Arrays;

/**
 * Immutable, strictly monotonic axis of a spectrum. A uniform axis is stored as first value and step
 * only, so that the long time series of a campaign do not repeat the same axis array.
 */
public final class SpectralAxis {

    private final AxisUnit unit;
    private final double first;
    private final double step;
    private final int size;
    private final double[] explicit; // null for a uniform axis

    private SpectralAxis(AxisUnit unit, double first, double step, int size, double[] explicit) {
        this.unit = unit;
        this.first = first;
        this.step = step;
        this.size = size;
        this.explicit = explicit;
    }

    /**
     * A uniform axis.
     *
     * @throws IllegalArgumentException if size is below 1, step is zero or not finite, or first is not finite
     */
    public static SpectralAxis uniform(AxisUnit unit, double first, double step, int size) {
        requireUnit(unit);
        if (size < 1) {
            throw new IllegalArgumentException("size must be at least 1, was " + size);
        }
        if (!Double.isFinite(first)) {
            throw new IllegalArgumentException("first must be finite, was " + first);
        }
        if (!(Double.isFinite(step) && step != 0.0)) {
            throw new IllegalArgumentException("step must be finite and non-zero, was " + step);
        }
        return new SpectralAxis(unit, first, step, size, null);
    }

    /**
     * An axis given point by point; the values are copied.
     *
     * @throws IllegalArgumentException if the values are empty, not finite, or not strictly monotonic
     *                                  (the message names the first offending index)
     */
    public static SpectralAxis of(AxisUnit unit, double... values) {
        requireUnit(unit);
        if (values == null || values.length == 0) {
            throw new IllegalArgumentException("axis values must not be empty");
        }
        double[] copy = values.clone();
        double sign = 0;
        for (int i = 0; i < copy.length; i++) {
            if (!Double.isFinite(copy[i])) {
                throw new IllegalArgumentException("axis value at index " + i + " is not finite: " + copy[i]);
            }
            if (i > 0) {
                double d = Math.signum(copy[i] - copy[i - 1]);
                if (d == 0 || (sign != 0 && d != sign)) {
                    throw new IllegalArgumentException("axis is not strictly monotonic at index " + i
                            + " (" + copy[i - 1] + " then " + copy[i] + ")");
                }
                sign = d;
            }
        }
        return new SpectralAxis(unit, copy[0], copy.length > 1 ? copy[1] - copy[0] : 1.0, copy.length, copy);
    }

    private static void requireUnit(AxisUnit unit) {
        if (unit == null) {
            throw new IllegalArgumentException("axis unit must not be null");
        }
    }

    public AxisUnit unit() {
        return unit;
    }

    public int size() {
        return size;
    }

    public boolean isUniform() {
        return explicit == null;
    }

    /** Step of a uniform axis. @throws IllegalStateException if the axis is not uniform */
    public double step() {
        if (explicit != null) {
            throw new IllegalStateException("axis is not uniform");
        }
        return step;
    }

    public double get(int index) {
        if (index < 0 || index >= size) {
            throw new IndexOutOfBoundsException("index " + index + " outside axis of size " + size);
        }
        return explicit != null ? explicit[index] : first + step * index;
    }

    public double first() {
        return get(0);
    }

    public double last() {
        return get(size - 1);
    }

    public boolean isAscending() {
        return size == 1 || get(1) > get(0);
    }

    /** A copy of all axis values. */
    public double[] toArray() {
        if (explicit != null) {
            return explicit.clone();
        }
        double[] v = new double[size];
        for (int i = 0; i < size; i++) {
            v[i] = first + step * i;
        }
        return v;
    }

    /**
     * Index of the axis point nearest to a value (ties go to the lower index); values outside the axis give
     * the nearest end.
     */
    public int nearestIndex(double value) {
        if (explicit == null) {
            long i = Math.round((value - first) / step);
            return (int) Math.max(0, Math.min(size - 1, i));
        }
        int best = 0;
        double bestDistance = Double.POSITIVE_INFINITY;
        for (int i = 0; i < size; i++) {
            double d = Math.abs(explicit[i] - value);
            if (d < bestDistance) {
                bestDistance = d;
                best = i;
            }
        }
        return best;
    }

    @Override
    public boolean equals(Object o) {
        if (!(o instanceof SpectralAxis)) {
            return false;
        }
        SpectralAxis a = (SpectralAxis) o;
        if (unit != a.unit || size != a.size) {
            return false;
        }
        if (explicit == null && a.explicit == null) {
            return Double.compare(first, a.first) == 0 && Double.compare(step, a.step) == 0;
        }
        return Arrays.equals(toArray(), a.toArray());
    }

    @Override
    public int hashCode() {
        return 31 * unit.hashCode() + Arrays.hashCode(toArray());
    }

    @Override
    public String toString() {
        return "SpectralAxis[" + unit + ", " + first() + " .. " + last() + ", " + size + " points"
                + (explicit == null ? ", step " + step : "") + "]";
    }
}
