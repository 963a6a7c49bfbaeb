package org.tracegas.library.synthesis;

import static org.tracegas.library.synthesis.PhysicalConstants.REFERENCE_TEMPERATURE;

/**
 * Pressure broadening and shift of a line (HITRAN definitions): half width at half maximum
 * gamma = (Tref/T)^n_air (gamma_air (p - p_self) + gamma_self p_self), centre v + delta_air p, pressures in atm.
 */
public final class LorentzWidth {

    private LorentzWidth() {
    }

    /** The Lorentz half width at half maximum in cm-1. */
    public static double halfWidth(SpectralLine line, AbsorptionPath path) {
        double p = path.pressureAtm();
        double self = path.selfPressureAtm();
        return Math.pow(REFERENCE_TEMPERATURE / path.temperature(), line.temperatureExponent())
                * (line.airHalfWidth() * (p - self) + line.selfHalfWidth() * self);
    }

    /** The pressure-shifted line centre in cm-1. */
    public static double centre(SpectralLine line, AbsorptionPath path) {
        return line.wavenumber() + line.pressureShift() * path.pressureAtm();
    }
}
