package org.tracegas.qa.uncertainty;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

class UncertaintyBudgetTest {

    /**
     * JCGM 100:2008 Annex H.1, end-gauge calibration, Table H.1 (values from memory): contributions 25 nm
     * (calibration of the standard), 9.7 nm (measured difference), 0 (α_s and θ, zero sensitivity), 2.9 nm
     * (δα: 0.58e-6 /°C x 0.05 m x 0.1 °C), 16.6 nm (δθ: 0.029 °C x 11.5e-6 /°C x 0.05 m); u_c = 32 nm.
     */
    @Test
    void gumAnnexH1Combination() {
        UncertaintyBudget b = UncertaintyBudget.of("end-gauge length", 50.000838e-3, "m", List.of(
                new UncertaintyComponent("l_s", 50.000623e-3, 25e-9, 1, "m"),
                new UncertaintyComponent("d", 215e-9, 9.7e-9, 1, "m"),
                new UncertaintyComponent("alpha_s", 11.5e-6, 1.2e-6, 0, "1/degC"),
                new UncertaintyComponent("theta", -0.1, 0.41, 0, "degC"),
                new UncertaintyComponent("delta alpha", 0, 0.58e-6, 0.05 * 0.1, "1/degC"),
                new UncertaintyComponent("delta theta", 0, 0.029, -0.05 * 11.5e-6, "degC")));
        assertEquals(32e-9, b.combinedStandardUncertainty(), 0.5e-9);
        assertEquals(2 * b.combinedStandardUncertainty(), b.expandedUncertainty(), 0);
        assertEquals(16.675e-9, b.rows().get(5).contribution(), 1e-12);
        double shares = b.rows().stream().mapToDouble(BudgetRow::sharePercent).sum();
        assertEquals(100.0, shares, 1e-9);
        assertTrue(b.rows().get(0).sharePercent() > 60, "the standard's calibration dominates");
    }

    @Test
    void correlatedInputs() {
        // JCGM 100:2008 5.2.2: for r = +1 the contributions add linearly, for r = -1 they subtract
        List<UncertaintyComponent> two = List.of(new UncertaintyComponent("a", 1, 3, 1, ""),
                new UncertaintyComponent("b", 1, 4, 1, ""));
        assertEquals(5.0, UncertaintyBudget.of("y", 2, "", two).combinedStandardUncertainty(), 1e-12);
        assertEquals(7.0, UncertaintyBudget.of("y", 2, "", two, new double[][] {{1, 1}, {1, 1}}, 2)
                .combinedStandardUncertainty(), 1e-12);
        assertEquals(1.0, UncertaintyBudget.of("y", 2, "", two, new double[][] {{1, -1}, {-1, 1}}, 2)
                .combinedStandardUncertainty(), 1e-12);
    }

    @Test
    void rejectsAsymmetricCorrelation() {
        List<UncertaintyComponent> two = List.of(new UncertaintyComponent("a", 1, 3, 1, ""),
                new UncertaintyComponent("b", 1, 4, 1, ""));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> UncertaintyBudget.of("y", 2, "", two, new double[][] {{1, 0.5}, {0.2, 1}}, 2));
        assertTrue(e.getMessage().contains("r[0][1]"), e.getMessage());
    }

    @Test
    void welchSatterthwaiteOfAWorkedPair() {
        // JCGM 100:2008 G.4.1: u1 = 1 with nu1 = 4 and u2 = 1 exactly known: nu_eff = (1 + 1)^2 / (1^4 / 4) = 16,
        // k95 = t95(16) = 2.12 (Table G.2)
        UncertaintyBudget b = UncertaintyBudget.of("y", 10, "ppm", List.of(
                new UncertaintyComponent("repeatability", 10, 1, 1, "ppm", 4),
                new UncertaintyComponent("reference", 1, 1, 1, "ppm")));
        assertEquals(16.0, b.effectiveDegreesOfFreedom(), 1e-12);
        assertEquals(2.12, b.coverageFactorFor(0.95), 0.005);
    }

    @Test
    void welchSatterthwaiteCoverageHoldsWhereKTwoFallsShort() {
        // Monte Carlo as the outside truth: a mean of 3 readings (Type A, nu = 2, true u = 1) plus an exactly
        // known Type B input of u = 0.3; over 20000 draws the interval y +- t95(nu_eff) u_c holds the truth
        // 92-97 % of the time (Welch-Satterthwaite is an approximation), y +- 2 u_c well below 90 %
        java.util.Random rnd = new java.util.Random(3);
        int draws = 20000;
        int welch = 0;
        int two = 0;
        for (int i = 0; i < draws; i++) {
            double[] x = new double[3];
            double mean = 0;
            for (int j = 0; j < 3; j++) {
                x[j] = Math.sqrt(3) * rnd.nextGaussian();
                mean += x[j] / 3;
            }
            double ss = 0;
            for (double v : x) {
                ss += (v - mean) * (v - mean);
            }
            double uA = Math.sqrt(ss / 2 / 3);
            double y = mean + 0.3 * rnd.nextGaussian();
            UncertaintyBudget b = UncertaintyBudget.of("y", y, "ppm", List.of(
                    new UncertaintyComponent("repeatability", y, uA, 1, "ppm", 2),
                    new UncertaintyComponent("calibration", 0, 0.3, 1, "ppm")));
            double uc = b.combinedStandardUncertainty();
            welch += Math.abs(y) <= b.coverageFactorFor(0.95) * uc ? 1 : 0;
            two += Math.abs(y) <= 2 * uc ? 1 : 0;
        }
        double welchCoverage = 100.0 * welch / draws;
        double twoCoverage = 100.0 * two / draws;
        assertTrue(welchCoverage >= 92 && welchCoverage <= 97, welchCoverage + " %");
        assertTrue(twoCoverage < 90, twoCoverage + " %");
    }
}
