package org.tracegas.library.synthesis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class AbsorptionPathTest {

    /**
     * Loschmidt constant n0 = 2.686780111e25 m^-3 at 273.15 K and 101.325 kPa (CODATA 2018); an ideal gas at 296 K
     * holds n0 273.15 / 296 molecules per m^3, here for the pure absorber in cm^-3.
     */
    @Test
    void pureGasDensityFollowsTheLoschmidtConstant() {
        AbsorptionPath path = new AbsorptionPath(296.0, 101.325, 1e6, 1.0);
        double expected = 2.686780111e25 * 273.15 / 296.0 * 1e-6;
        assertEquals(expected, path.absorberDensity(), 1e-9 * expected);
    }

    @Test
    void derivedQuantities() {
        AbsorptionPath path = new AbsorptionPath(300.0, 50.6625, 250.0, 8.0);
        assertEquals(0.5, path.pressureAtm(), 1e-15);
        assertEquals(0.5 * 250e-6, path.selfPressureAtm(), 1e-18);
        assertEquals(800.0, path.pathLengthCm(), 0);
        assertEquals(2000.0, path.concentrationPathLength(), 0);
    }

    @Test
    void rejectsImpossibleValuesByName() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new AbsorptionPath(296, 101.325, 2e6, 1));
        assertTrue(e.getMessage().startsWith("concentration"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> new AbsorptionPath(0, 101.325, 10, 1));
        assertTrue(e.getMessage().startsWith("temperature"), e.getMessage());
    }
}
