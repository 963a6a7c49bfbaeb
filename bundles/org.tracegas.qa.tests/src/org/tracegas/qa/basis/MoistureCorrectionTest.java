package org.tracegas.qa.basis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class MoistureCorrectionTest {

    @Test
    void wetToDry() {
        // c_dry = c_wet / (1 - x_H2O): 100 at 20 % water vapour is 125 on dry gas (hand-computed)
        assertEquals(125.0, MoistureCorrection.toDry(100, 0.20), 1e-12);
        assertEquals(100.0, MoistureCorrection.toDry(100, 0.0), 0);
    }

    @Test
    void rejectsWaterFractionOfOne() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> MoistureCorrection.toDry(100, 1.0));
        assertTrue(e.getMessage().contains("h2oFraction"), e.getMessage());
    }
}
