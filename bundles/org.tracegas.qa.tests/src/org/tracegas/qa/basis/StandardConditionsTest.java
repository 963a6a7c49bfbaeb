package org.tracegas.qa.basis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class StandardConditionsTest {

    @Test
    void molarVolumeAtZeroCelsius() {
        // 22.414 L/mol at 273.15 K, 101.325 kPa: common practice, no source
        assertEquals(22.414, StandardConditions.NORMAL.molarVolumeLitresPerMol(), 0.0005);
    }

    @Test
    void molarVolumeAt25Celsius() {
        // 24.45 L/mol at 298.15 K, 101.325 kPa: common practice, no source. The figure is rounded: R·T/p gives
        // 24.465 L/mol, so agreement within 0.1 % is what the trade figure supports
        assertEquals(24.45, StandardConditions.AMBIENT_25C.molarVolumeLitresPerMol(), 0.025);
    }

    @Test
    void carbonMonoxidePpmToMass() {
        // 100 ppm CO (M = 28.010 g/mol) = 124.97 mg/m³ at 273.15 K, 101.325 kPa: common practice, no source
        assertEquals(124.97, StandardConditions.NORMAL.ppmToMgPerCubicMetre(100, 28.010), 0.005);
        // the same at 298.15 K is smaller by 273.15/298.15 (ideal gas law)
        assertEquals(124.97 * 273.15 / 298.15, StandardConditions.AMBIENT_25C.ppmToMgPerCubicMetre(100, 28.010),
                0.005);
    }

    @Test
    void massBackToPpm() {
        StandardConditions c = StandardConditions.EU_EMISSIONS;
        assertEquals(37.5, c.mgPerCubicMetreToPpm(c.ppmToMgPerCubicMetre(37.5, 64.066), 64.066), 1e-12);
    }

    @Test
    void rejectsNonPositiveMolarMass() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> StandardConditions.NORMAL.ppmToMgPerCubicMetre(10, 0));
        assertTrue(e.getMessage().contains("molarMassGPerMol"), e.getMessage());
    }
}
