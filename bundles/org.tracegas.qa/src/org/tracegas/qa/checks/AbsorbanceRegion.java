package org.tracegas.qa.checks;

import org.tracegas.qa.internal.Require;

/**
 * Wavenumber region of an absorbance spectrum, inclusive at both ends.
 *
 * @param fromCm lower wavenumber in cm-1
 * @param toCm   upper wavenumber in cm-1
 */
public record AbsorbanceRegion(double fromCm, double toCm) {

    public AbsorbanceRegion {
        Require.finite("fromCm", fromCm);
        Require.finite("toCm", toCm);
        if (fromCm >= toCm) {
            throw new IllegalArgumentException("region must satisfy fromCm < toCm, was " + fromCm + " .. " + toCm);
        }
    }

    public boolean contains(double wavenumber) {
        return wavenumber >= fromCm && wavenumber <= toCm;
    }
}
