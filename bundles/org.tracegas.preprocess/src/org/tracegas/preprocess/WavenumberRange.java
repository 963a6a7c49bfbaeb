package org.tracegas.preprocess;

/** A closed wavenumber interval [low, high] in cm-1; a single point has low == high. */
public record WavenumberRange(double low, double high) {

    /** @throws IllegalArgumentException if a bound is not finite or low exceeds high */
    public WavenumberRange {
        if (!Double.isFinite(low) || !Double.isFinite(high) || low > high) {
            throw new IllegalArgumentException("wavenumber range must have finite low <= high, was " + low + " .. "
                    + high);
        }
    }

    public boolean contains(double wavenumber) {
        return wavenumber >= low && wavenumber <= high;
    }

    /** "low:high", with the shortest decimal that reads back to the same doubles. */
    @Override
    public String toString() {
        return low + ":" + high;
    }

    /**
     * Parses "low:high" or a single "point".
     *
     * @throws IllegalArgumentException naming the text
     */
    public static WavenumberRange parse(String text) {
        String[] parts = text.trim().split(":", -1);
        try {
            if (parts.length == 1) {
                double v = Double.parseDouble(parts[0]);
                return new WavenumberRange(v, v);
            }
            if (parts.length == 2) {
                return new WavenumberRange(Double.parseDouble(parts[0]), Double.parseDouble(parts[1]));
            }
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException("wavenumber range '" + text + "' is not low:high in cm-1", e);
        }
        throw new IllegalArgumentException("wavenumber range '" + text + "' is not low:high in cm-1");
    }
}
