package org.tracegas.qa.uncertainty;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class GumPropagationTest {

    /**
     * JCGM 100:2008 Annex H.1 (from memory): l = l_s + d − l_s(δα·θ + α_s·δθ) with l_s = 50.000623 mm,
     * d = 215 nm, α_s = 11.5e-6 /°C, θ = −0.1 °C, δα = δθ = 0; result 50.000838 mm, u_c = 32 nm.
     */
    @Test
    void endGaugeModelGivesTheGumSensitivitiesAndResult() {
        MeasurementModel endGauge = x -> x[0] + x[1] - x[0] * (x[4] * x[3] + x[2] * x[5]);
        UncertaintyBudget b = GumPropagation.budget("l", "m", endGauge,
                new String[] {"l_s", "d", "alpha_s", "theta", "delta alpha", "delta theta"},
                new double[] {50.000623e-3, 215e-9, 11.5e-6, -0.1, 0, 0},
                new double[] {25e-9, 9.7e-9, 1.2e-6, 0.41, 0.58e-6, 0.029},
                new String[] {"m", "m", "1/degC", "degC", "1/degC", "degC"});
        assertEquals(50.000838e-3, b.value(), 1e-12);
        assertEquals(1.0, b.components().get(0).sensitivity(), 1e-9);
        assertEquals(0.0, b.components().get(2).sensitivity(), 1e-12); // −l_s·δθ = 0
        assertEquals(0.0, b.components().get(3).sensitivity(), 1e-12); // −l_s·δα = 0
        assertEquals(50.000623e-3 * 0.1, b.components().get(4).sensitivity(), 1e-10); // −l_s·θ
        assertEquals(-50.000623e-3 * 11.5e-6, b.components().get(5).sensitivity(), 1e-15); // −l_s·α_s
        assertEquals(32e-9, b.combinedStandardUncertainty(), 0.5e-9);
    }
}
