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

    @Test
    void theBudgetOfAResultIsAtThePathItWasCorrectedTo() {
        // a budget stated for the nominal 5.0 m, evaluated for a result corrected to a CTS-derived 5.12 m: the
        // same as one stated for 5.12 m, whose path row the numeric GUM model above checks
        FtirResultBudget nominal = new FtirResultBudget(0.02, 5.0, 0.05, 1.5, 0.3);
        FtirResultBudget derived = new FtirResultBudget(0.02, 5.12, 0.05, 1.5, 0.3);
        UncertaintyBudget atCts = nominal.budget("HCl", 25.0, 0.4, 5.12, 458.0, 99.8);
        UncertaintyBudget stated = derived.budget("HCl", 25.0, 0.4, 458.0, 99.8);
        assertEquals(5.12, atCts.components().get(2).estimate(), 0);
        assertEquals(stated.combinedStandardUncertainty(), atCts.combinedStandardUncertainty(), 0);
        // |c_i u| of the path = C u(L) / L = 25 x 0.05 / 5.12 = 0.244140625 ppm (hand-computed)
        assertEquals(0.244140625, Math.abs(atCts.components().get(2).contribution()), 1e-12);
    }

    @Test
    void basisBudgetWorkedByHand() {
        // worked by hand: C = 50 ppm wet, h = 0.15 ± 0.005, O2 = 8.0 ± 0.2 % dry, reference 11 %.
        // F = 1/0.85 · 10/13 = 0.9049774, E = 45.248869 ppm;
        // c_h = E/(1 − h) = 53.233963 ppm per mol/mol, c_h·u = 0.2661698 ppm;
        // c_O2 = E/(21 − 8) = 3.4806822 ppm per % vol, c_O2·u = 0.6961364 ppm
        UncertaintyBudget b = new FtirResultBudget(0.02, 5.0, 0.05, 1.5, 0.3).budgetOnBasis("CO", 50, 1.0, 453.15,
                101.3, new BasisConversion(0.15, 0.005, 8.0, 0.2, false, 11));
        assertEquals(45.248869, b.value(), 1e-6);
        assertEquals(7, b.components().size());
        UncertaintyComponent h2o = b.components().get(5);
        UncertaintyComponent o2 = b.components().get(6);
        assertEquals(FtirResultBudget.H2O_ROW, h2o.name());
        assertEquals(53.233963, h2o.sensitivity(), 1e-6);
        assertEquals(0.2661698, h2o.contribution(), 1e-7);
        assertEquals(FtirResultBudget.O2_ROW, o2.name());
        assertEquals(3.4806822, o2.sensitivity(), 1e-7);
        assertEquals(0.6961364, o2.contribution(), 1e-7);
        // fit row: c = F, so c·u = 0.9049774 ppm
        assertEquals(0.9049774, b.components().get(0).contribution(), 1e-7);
    }

    @Test
    void basisBudgetSensitivitiesMatchNumericDerivativesOfTheWholeModel() {
        double lNom = 5.0;
        double tNom = 453.15;
        double pNom = 101.325;
        // E = C_fit · s_ref · (L_nom/L) · (T/T_nom) · (p_nom/p) · (21 − 11) / (21 (1 − h) − O2_wet)
        MeasurementModel model = x -> x[0] * x[1] * (lNom / x[2]) * (x[3] / tNom) * (pNom / x[4]) * 10.0
                / (21 * (1 - x[5]) - x[6]);
        double[] est = {25.0, 1.0, 5.12, 458.0, 99.8, 0.16, 7.4};
        double[] u = {0.4, 0.02, 0.05, 1.5, 0.3, 0.004, 0.15};
        UncertaintyBudget numeric = GumPropagation.budget("HCl", "ppm", model, new String[] {"fit", "ref", "L", "T",
                "p", "h", "O2"}, est, u, new String[] {"ppm", "1", "m", "K", "kPa", "mol/mol", "% vol"});
        double c = model.value(new double[] {25.0, 1.0, 5.12, 458.0, 99.8, 0, 10.0}) * 11.0 / 10.0;
        // c: the concentration at actual conditions before the conversion (the factor at h = 0, O2 = 10 is 10/11)
        UncertaintyBudget analytic = new FtirResultBudget(0.02, 5.12, 0.05, 1.5, 0.3).budgetOnBasis("HCl", c,
                0.4 * c / 25.0, 458.0, 99.8, new BasisConversion(0.16, 0.004, 7.4, 0.15, true, 11));
        assertEquals(numeric.value(), analytic.value(), 1e-9 * numeric.value());
        for (int i = 0; i < 7; i++) {
            double expected = numeric.components().get(i).contribution();
            // difference quotient over ± u departs from the derivative by about (u/x)²
            assertEquals(expected, analytic.components().get(i).contribution(), 5e-4 * Math.abs(expected),
                    "component " + i);
        }
    }
}
