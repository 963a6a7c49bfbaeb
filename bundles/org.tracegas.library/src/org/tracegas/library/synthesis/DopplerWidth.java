package org.tracegas.library.synthesis;

import static org.tracegas.library.synthesis.PhysicalConstants.AVOGADRO;
import static org.tracegas.library.synthesis.PhysicalConstants.BOLTZMANN;
import static org.tracegas.library.synthesis.PhysicalConstants.SPEED_OF_LIGHT;

/** Doppler (Gaussian) width of a line: HWHM = v/c sqrt(2 ln2 kT/m), standard deviation sigma = v/c sqrt(kT/m). */
public final class DopplerWidth {

    private DopplerWidth() {
    }

    /**
     * @param wavenumber  line position in cm-1
     * @param temperature in K
     * @param molarMass   of the absorbing molecule in g/mol
     * @return the Gaussian standard deviation in cm-1
     */
    public static double sigma(double wavenumber, double temperature, double molarMass) {
        if (!(temperature > 0) || !(molarMass > 0)) {
            throw new IllegalArgumentException("temperature and molarMass must be positive, were " + temperature
                    + " and " + molarMass);
        }
        double massKg = molarMass * 1e-3 / AVOGADRO;
        return wavenumber / SPEED_OF_LIGHT * Math.sqrt(BOLTZMANN * temperature / massKg);
    }

    /** The half width at half maximum in cm-1; arguments as for {@link #sigma}. */
    public static double halfWidth(double wavenumber, double temperature, double molarMass) {
        return sigma(wavenumber, temperature, molarMass) * Math.sqrt(2.0 * Math.log(2.0));
    }
}
