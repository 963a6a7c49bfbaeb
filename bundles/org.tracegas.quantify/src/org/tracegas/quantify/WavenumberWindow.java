package org.tracegas.quantify;

/**
 * A closed wavenumber interval [low, high] in cm-1; every axis point inside it takes part in the fit.
 *
 * @param low  lower bound in cm-1
 * @param high upper bound in cm-1, above {@code low}
 */
public record WavenumberWindow(double low, double high) {

    /** @throws IllegalArgumentException if a bound is not finite or high is not above low */
    public WavenumberWindow {
        if (!Double.isFinite(low) || !Double.isFinite(high)) {
            throw new IllegalArgumentException("window bounds must be finite, were " + low + " and " + high);
        }
        if (!(high > low)) {
            throw new IllegalArgumentException("window high (" + high + ") must be above low (" + low + ")");
        }
    }

    public boolean contains(double wavenumber) {
        return wavenumber >= low && wavenumber <= high;
    }

    public boolean overlaps(WavenumberWindow other) {
        return low <= other.high && other.low <= high;
    }

    @Override
    public String toString() {
        return low + ".." + high + " cm-1";
    }
}
