package org.tracegas.library.synthesis;

/**
 * One transition of a line list, with the parameters of the HITRAN 2004+ format at the reference
 * temperature of 296 K and pressure of 1 atm.
 *
 * @param moleculeId          HITRAN molecule number
 * @param isotopologue        HITRAN isotopologue number (1 = most abundant)
 * @param wavenumber          vacuum wavenumber in cm-1
 * @param intensity           line intensity at 296 K in cm-1/(molecule cm-2), weighted by natural abundance
 * @param einsteinA           Einstein A coefficient in s-1
 * @param airHalfWidth        air-broadened Lorentz half width at half maximum in cm-1/atm
 * @param selfHalfWidth       self-broadened Lorentz half width at half maximum in cm-1/atm
 * @param lowerStateEnergy    lower-state energy E'' in cm-1
 * @param temperatureExponent exponent n_air of the temperature dependence of the air half width
 * @param pressureShift       air pressure shift delta_air in cm-1/atm
 */
public record SpectralLine(int moleculeId, int isotopologue, double wavenumber, double intensity, double einsteinA,
        double airHalfWidth, double selfHalfWidth, double lowerStateEnergy, double temperatureExponent,
        double pressureShift) {

    public SpectralLine {
        if (!(wavenumber > 0 && Double.isFinite(wavenumber))) {
            throw new IllegalArgumentException("wavenumber must be positive and finite, was " + wavenumber);
        }
        if (!(intensity >= 0 && Double.isFinite(intensity))) {
            throw new IllegalArgumentException("intensity must be non-negative and finite, was " + intensity);
        }
        if (!(airHalfWidth >= 0 && selfHalfWidth >= 0)) {
            throw new IllegalArgumentException("half widths must be non-negative, were air " + airHalfWidth
                    + " and self " + selfHalfWidth);
        }
        if (!Double.isFinite(lowerStateEnergy) || !Double.isFinite(temperatureExponent)
                || !Double.isFinite(pressureShift) || !Double.isFinite(einsteinA)) {
            throw new IllegalArgumentException("lowerStateEnergy, temperatureExponent, pressureShift and einsteinA "
                    + "must be finite");
        }
    }
}
