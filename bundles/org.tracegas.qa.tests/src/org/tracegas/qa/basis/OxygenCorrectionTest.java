package org.tracegas.qa.basis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class OxygenCorrectionTest {

    @Test
    void iedWorkedCase() {
        // EU IED 2010/75/EU Annex VI Part 7, E_S = (21 - O_S)/(21 - O_M) x E_M (from memory; the same formula is
        // in 13. BImSchV Anlage 4): 50 mg/m³ at 14 % O2 to 11 % O2 = 50 x 10/7 = 71.43 mg/m³ (hand-computed)
        assertEquals(71.428571, new OxygenCorrection(11, 20).correct(50, 14), 1e-6);
    }

    @Test
    void measuredAtReferenceIsUnchanged() {
        assertEquals(42.0, new OxygenCorrection(10, 20).correct(42.0, 10.0), 1e-12);
    }

    @Test
    void guardNearAir() {
        OxygenCorrection c = new OxygenCorrection(11, 20);
        assertTrue(c.canCorrect(19.9));
        assertFalse(c.canCorrect(20.0));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> c.correct(50, 20.5));
        assertTrue(e.getMessage().contains("measured O2") && e.getMessage().contains("20.5"), e.getMessage());
    }

    @Test
    void rejectsReferenceAtAir() {
        assertThrows(IllegalArgumentException.class, () -> new OxygenCorrection(21, 20));
    }
}
