package org.tracegas.library;

/**
 * Immutable conditions under which a reference spectrum holds.
 *
 * @param concentrationPathLength concentration times path length in ppm·m, positive
 * @param temperature             cell temperature in K, positive
 * @param pressure                cell pressure in kPa, positive
 * @param resolution              nominal spectral resolution in cm-1, positive
 * @param apodization             name of the apodization function, not blank
 */
public record ReferenceConditions(double concentrationPathLength, double temperature, double pressure,
        double resolution, String apodization) {

    public ReferenceConditions {
        requirePositive(concentrationPathLength, "concentrationPathLength");
        requirePositive(temperature, "temperature");
        requirePositive(pressure, "pressure");
        requirePositive(resolution, "resolution");
        if (apodization == null || apodization.isBlank()) {
            throw new IllegalArgumentException("apodization must not be blank");
        }
    }

    static void requirePositive(double value, String field) {
        if (!(value > 0 && Double.isFinite(value))) {
            throw new IllegalArgumentException(field + " must be positive and finite, was " + value);
        }
    }
}
