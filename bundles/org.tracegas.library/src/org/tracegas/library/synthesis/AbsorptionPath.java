package org.tracegas.library.synthesis;

import static org.tracegas.library.synthesis.PhysicalConstants.ATMOSPHERE_KPA;
import static org.tracegas.library.synthesis.PhysicalConstants.BOLTZMANN;

/**
 * Gas in a cell: temperature, total pressure, the absorber's concentration and the optical path length.
 *
 * @param temperature   in K, positive
 * @param pressure      total pressure in kPa, positive
 * @param concentration mole fraction of the absorber in ppm, positive, at most 1e6
 * @param pathLength    optical path length in m, positive
 */
public record AbsorptionPath(double temperature, double pressure, double concentration, double pathLength) {

    public AbsorptionPath {
        requirePositive(temperature, "temperature");
        requirePositive(pressure, "pressure");
        requirePositive(pathLength, "pathLength");
        if (!(concentration > 0 && concentration <= 1e6)) {
            throw new IllegalArgumentException("concentration must lie in (0, 1e6] ppm, was " + concentration);
        }
    }

    private static void requirePositive(double value, String field) {
        if (!(value > 0 && Double.isFinite(value))) {
            throw new IllegalArgumentException(field + " must be positive and finite, was " + value);
        }
    }

    public double pressureAtm() {
        return pressure / ATMOSPHERE_KPA;
    }

    /** Partial pressure of the absorber in atm. */
    public double selfPressureAtm() {
        return pressureAtm() * concentration * 1e-6;
    }

    /** Absorber molecules per cm^3, ideal gas: x p / (kT). */
    public double absorberDensity() {
        return concentration * 1e-6 * pressure * 1e3 / (BOLTZMANN * temperature) * 1e-6;
    }

    public double pathLengthCm() {
        return pathLength * 100.0;
    }

    /** Concentration times path length in ppm·m. */
    public double concentrationPathLength() {
        return concentration * pathLength;
    }
}
