package org.tracegas.quantify.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Map;

import org.junit.jupiter.api.Test;

class LinearDesignTest {

    /**
     * NIST StRD linear regression "Longley" (higher difficulty), certified values; data from Longley (1967),
     * J. Amer. Statist. Assoc. 62, 819-841. Coefficients to 10 significant digits, their standard deviations to 9.
     */
    @Test
    void longleyMatchesNistCertifiedValues() throws Exception {
        double[][] data = ReferenceCsv.numericRows(getClass(), "nist-strd-longley.csv");
        Map<String, double[]> certified = ReferenceCsv.keyed(getClass(), "nist-strd-longley-certified.csv");
        int n = data.length;
        double[][] columns = new double[7][n];
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            y[i] = data[i][0];
            columns[0][i] = 1.0;
            for (int j = 1; j <= 6; j++) {
                columns[j][i] = data[i][j];
            }
        }
        LinearSolution fit = LinearDesign.of(columns, null, "Longley").solve(y);
        for (int j = 0; j <= 6; j++) {
            double[] c = certified.get("b" + j);
            // NIST StRD Longley certified coefficient and standard deviation
            assertEquals(c[0], fit.coefficient(j), Math.abs(c[0]) * 1e-10, "b" + j);
            assertEquals(c[1], fit.standardDeviation(j), Math.abs(c[1]) * 1e-9, "sd(b" + j + ")");
        }
        // NIST StRD Longley certified residual standard deviation and R squared
        assertEquals(certified.get("residual_sd")[0], Math.sqrt(fit.residualVariance()),
                certified.get("residual_sd")[0] * 1e-9);
        double mean = 0;
        for (double v : y) {
            mean += v / n;
        }
        double tss = 0;
        for (double v : y) {
            tss += (v - mean) * (v - mean);
        }
        assertEquals(certified.get("r_squared")[0], 1 - fit.weightedRss() / tss, 1e-10);
    }

    @Test
    void weightsEqualToRepeatedPoints() {
        // a weight of 2 on a point is the same as that point twice (definition of weighted least squares)
        double[][] cols = {{1, 1, 1, 1}, {0, 1, 2, 3}};
        double[] y = {0.1, 1.2, 1.9, 3.3};
        LinearSolution weighted = LinearDesign.of(cols, new double[] {2, 1, 1, 1}, "weighted").solve(y);
        double[][] repeated = {{1, 1, 1, 1, 1}, {0, 0, 1, 2, 3}};
        LinearSolution plain = LinearDesign.of(repeated, null, "repeated").solve(new double[] {0.1, 0.1, 1.2, 1.9, 3.3});
        assertEquals(plain.coefficient(0), weighted.coefficient(0), 1e-13);
        assertEquals(plain.coefficient(1), weighted.coefficient(1), 1e-13);
        assertEquals(plain.weightedRss(), weighted.weightedRss(), 1e-13);
    }

    @Test
    void refusesColumnsThatCannotBeToldApart() {
        double[][] cols = {{1, 2, 3, 4}, {2, 4, 6, 8}};
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> LinearDesign.of(cols, null, "design of CO"));
        assertTrue(e.getMessage().contains("design of CO"), e.getMessage());
    }

    @Test
    void refusesTooFewPoints() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> LinearDesign.of(new double[][] {{1, 2}, {3, 5}}, null, "tiny"));
        assertTrue(e.getMessage().contains("more points than coefficients"), e.getMessage());
    }
}
