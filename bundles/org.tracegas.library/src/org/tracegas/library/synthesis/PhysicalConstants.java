package org.tracegas.library.synthesis;

/** Physical constants of CODATA 2018 (exact SI values where the SI defines them) and the HITRAN reference state. */
public final class PhysicalConstants {

    /** Second radiation constant hc/k in cm K (CODATA 2018: 1.438776877e-2 m K). */
    public static final double C2 = 1.4387769;
    /** Boltzmann constant in J/K (exact in the SI since 2019). */
    public static final double BOLTZMANN = 1.380649e-23;
    /** Speed of light in vacuum in m/s (exact). */
    public static final double SPEED_OF_LIGHT = 299_792_458.0;
    /** Avogadro constant in 1/mol (exact). */
    public static final double AVOGADRO = 6.02214076e23;
    /** Reference temperature of HITRAN line intensities and widths, in K. */
    public static final double REFERENCE_TEMPERATURE = 296.0;
    /** One standard atmosphere in kPa, the reference pressure of HITRAN widths and shifts. */
    public static final double ATMOSPHERE_KPA = 101.325;

    private PhysicalConstants() {
    }
}
