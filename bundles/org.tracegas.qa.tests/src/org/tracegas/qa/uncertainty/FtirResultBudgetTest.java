package org.tracegas.qa.uncertainty;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class FtirResultBudgetTest {

    @Test
    void analyticSensitivitiesMatchTheProductModel() {
        // C = C_fit · s_ref · (L_nom/L) · (T/T_nom) · (p_nom/p) evaluated at the actual conditions
        double lNom = 5.0;
        double tNom = 453.15;
        double pNom = 101.325;
        MeasurementModel model = x -> x[0] * x[1] * (lNom / x[2]) * (x[3] / tNom) * (pNom / x[4]);
        double[] est = {25.0, 1.0, 5.12, 458.0, 99.8};
        double[] u = {0.4, 0.02, 0.05, 1.5, 0.3};
        UncertaintyBudget numeric = GumPropagation.budget("HCl", "ppm", model,
                new String[] {"spectral fit", "reference spectrum", "path length", "cell temperature", "cell pressure"},
                est, u, new String[] {"ppm", "1", "m", "K", "kPa"});
        double c = numeric.value();
        // the fit uncertainty is given on C itself, so scale it like C
        UncertaintyBudget analytic = new FtirResultBudget(0.02, 5.12, 0.05, 1.5, 0.3)
                .budget("HCl", c, 0.4 * c / 25.0, 458.0, 99.8);
        // the difference quotient over ± u departs from the derivative by about (u/x)² (1e-4 for the path)
        for (int i = 1; i < 5; i++) {
            double expected = numeric.components().get(i).contribution();
            assertEquals(expected, analytic.components().get(i).contribution(), 5e-4 * Math.abs(expected),
                    "component " + i);
        }
        assertEquals(numeric.combinedStandardUncertainty(), analytic.combinedStandardUncertainty(),
                5e-4 * numeric.combinedStandardUncertainty());
        assertEquals(2 * analytic.combinedStandardUncertainty(), analytic.expandedUncertainty(), 0);
    }
}
