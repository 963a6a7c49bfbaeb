package org.tracegas.qa.uncertainty;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class BasisConversionTest {

    private static final double H = 1e-6;

    /** E/c_wet as written in the standards' formulas, independent of the class under test. */
    private static double factor(double h, double o2, boolean wet, double ref) {
        double o2Dry = wet ? o2 / (1 - h) : o2;
        return 1 / (1 - h) * (21 - ref) / (21 - o2Dry);
    }

    @Test
    void sensitivitiesMatchCentralDifferencesOnDryAndWetO2() {
        for (boolean wet : new boolean[] {false, true}) {
            double h = 0.17;
            double o2 = wet ? 7.1 : 8.6;
            BasisConversion b = new BasisConversion(h, 0.004, o2, 0.2, wet, 11);
            assertEquals(factor(h, o2, wet, 11), b.factor(), 1e-14);
            // numeric derivative of ln F: (F(x+H) − F(x−H)) / 2H / F
            double dh = (factor(h + H, o2, wet, 11) - factor(h - H, o2, wet, 11)) / (2 * H) / b.factor();
            double dO2 = (factor(h, o2 + H, wet, 11) - factor(h, o2 - H, wet, 11)) / (2 * H) / b.factor();
            assertEquals(dh, b.relativeH2oSensitivity(), 1e-7 * dh, "h, wet O2 " + wet);
            assertEquals(dO2, b.relativeO2Sensitivity(), 1e-7 * dO2, "O2, wet O2 " + wet);
        }
    }

    @Test
    void dryOnlyConversion() {
        BasisConversion b = BasisConversion.dryOnly(0.2, 0.01);
        // 1/(1 − 0.2) = 1.25, d ln F / dh = 1/(1 − h) = 1.25 (worked by hand)
        assertEquals(1.25, b.factor(), 1e-15);
        assertEquals(1.25, b.relativeH2oSensitivity(), 1e-15);
        assertEquals(0, b.relativeO2Sensitivity());
    }

    @Test
    void o2AtOrAboveAirIsRefusedByName() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new BasisConversion(0.2, 0.01, 17.0, 0.2, true, 11));
        // 17 % on wet gas with 20 % water is 21.25 % on dry gas
        assertTrue(e.getMessage().startsWith("o2Percent"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> new BasisConversion(1.0, 0.01, 8, 0.2, false, 11));
    }
}
