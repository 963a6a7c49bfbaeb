package org.tracegas.quantify.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Map;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.junit.jupiter.api.Test;

class LevenbergMarquardtTest {

    /**
     * NIST StRD non-linear regression "Misra1a" (lower difficulty), y = b1 (1 - exp(-b2 x)), from both NIST start
     * points: certified b1, b2, their standard deviations and the residual sum of squares, to 6 significant digits.
     */
    @ParameterizedTest
    @ValueSource(strings = {"start1", "start2"})
    void misra1aMatchesNistCertifiedValues(String start) throws Exception {
        double[][] data = ReferenceCsv.numericRows(getClass(), "nist-strd-misra1a.csv");
        Map<String, double[]> certified = ReferenceCsv.keyed(getClass(), "nist-strd-misra1a-certified.csv");
        double[] x = new double[data.length];
        double[] y = new double[data.length];
        for (int i = 0; i < data.length; i++) {
            x[i] = data[i][0];
            y[i] = data[i][1];
        }
        ModelFunction misra = (b, values, jacobian) -> {
            for (int i = 0; i < x.length; i++) {
                double e = Math.exp(-b[1] * x[i]);
                values[i] = b[0] * (1 - e);
                jacobian[i][0] = 1 - e;
                jacobian[i][1] = b[0] * x[i] * e;
            }
        };
        double[] start0 = {certified.get(start + "_b1")[0], certified.get(start + "_b2")[0]};
        NonlinearFit fit = new LevenbergMarquardt(1000, 1e-12).fit(misra, y, null, start0);
        for (int j = 0; j < 2; j++) {
            double[] c = certified.get("b" + (j + 1));
            // NIST StRD Misra1a certified parameter and its standard deviation
            assertEquals(c[0], fit.parameters()[j], Math.abs(c[0]) * 1e-6, "b" + (j + 1));
            assertEquals(c[1], fit.standardDeviations()[j], Math.abs(c[1]) * 1e-6, "sd(b" + (j + 1) + ")");
        }
        // NIST StRD Misra1a certified residual sum of squares
        double rss = certified.get("residual_sum_of_squares")[0];
        assertEquals(rss, fit.weightedRss(), rss * 1e-6);
        assertTrue(fit.iterations() > 1, "a fit from a distant start takes several iterations");
    }

    @Test
    void refusesNoIterations() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> new LevenbergMarquardt(0, 1e-9));
        assertTrue(e.getMessage().contains("maxIterations"));
    }
}
