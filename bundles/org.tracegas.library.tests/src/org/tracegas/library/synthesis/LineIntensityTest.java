package org.tracegas.library.synthesis;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class LineIntensityTest {

    private static final double C2 = 1.438776877; // CODATA 2018 hc/k in cm K

    private static SpectralLine line(double wavenumber, double lowerEnergy) {
        return new SpectralLine(5, 1, wavenumber, 1e-20, 1.0, 0.07, 0.08, lowerEnergy, 0.7, 0.0);
    }

    @Test
    void isUnchangedAtTheReferenceTemperature() {
        SpectralLine l = line(2100, 800);
        assertEquals(1e-20, LineIntensity.at(l, 296.0, PowerLawPartitionFunction.linearMolecule()), 1e-34);
    }

    /**
     * Two lines at one wavenumber differ only in E'': the ratio of their intensities changes with temperature by
     * the Boltzmann factor exp(-c2 dE (1/T - 1/Tref)) (statistical mechanics; HITRAN definitions, Simeckova et al.
     * 2006), whatever Q does.
     */
    @Test
    void lowerStateEnergyActsThroughTheBoltzmannFactor() {
        PartitionFunction q = PowerLawPartitionFunction.nonLinearMolecule();
        double t = 400.0;
        double ratio = LineIntensity.at(line(2100, 1500), t, q) / LineIntensity.at(line(2100, 300), t, q);
        assertEquals(Math.exp(-C2 * 1200 * (1 / t - 1 / 296.0)), ratio, 1e-6 * ratio);
    }

    /**
     * For E'' = 0 and c2 v / T large the stimulated-emission factor is 1 and S(T)/S(Tref) = Q(Tref)/Q(T), which is
     * Tref/T for a linear rigid rotor.
     */
    @Test
    void groundStateLineFollowsThePartitionFunction() {
        double s = LineIntensity.at(line(4000, 0), 250.0, PowerLawPartitionFunction.linearMolecule());
        assertEquals(1e-20 * 296.0 / 250.0, s, 1e-8 * s); // stimulated emission changes it by 4e-9
    }

    /**
     * At 100 cm-1 and 600 K the stimulated-emission factor (1 - exp(-c2 v/T)) / (1 - exp(-c2 v/Tref)) is far
     * from 1; here it is computed from the definition.
     */
    @Test
    void stimulatedEmissionMattersForLowWavenumbers() {
        PartitionFunction flat = temperature -> 1.0;
        double s = LineIntensity.at(line(100, 0), 600.0, flat);
        double expected = 1e-20 * (1 - Math.exp(-C2 * 100 / 600.0)) / (1 - Math.exp(-C2 * 100 / 296.0));
        assertEquals(expected, s, 1e-6 * expected);
    }
}
