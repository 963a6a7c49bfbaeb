package org.tracegas.library.synthesis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class ContinuedFractionFaddeevaTest {

    /**
     * SciPy 1.17.1 scipy.special.wofz (faddeeva-scipy.csv), relative 1e-6 asked by the reference data README;
     * Weideman (N = 40) inside |z| &lt; 8 and the continued fraction outside together reach a relative 1e-9.
     */
    @Test
    void standardFunctionAgreesWithScipyWofz() {
        FaddeevaFunction w = FaddeevaFunction.standard();
        double worst = 0;
        for (double[] row : ScipyReference.rows("faddeeva-scipy.csv")) {
            ComplexValue v = w.value(row[0], row[1]);
            double re = ScipyReference.relativeError(v.re(), row[2]);
            double im = ScipyReference.relativeError(v.im(), row[3]);
            worst = Math.max(worst, Math.max(Double.isNaN(re) ? 0 : re, Double.isNaN(im) ? 0 : im));
            assertEquals(v.re(), w.real(row[0], row[1]), 0.0);
        }
        assertTrue(worst < 1e-9, "worst relative error " + worst);
    }

    /**
     * Outside |z| = 8 the fraction is used; it must match Weideman with many terms (N = 64, within 1e-9 of
     * SciPy's wofz) on rings just outside the switch and far out.
     */
    @Test
    void continuesWeidemanSmoothlyBeyondTheSwitch() {
        FaddeevaFunction fraction = new ContinuedFractionFaddeeva(new WeidemanFaddeeva(32));
        WeidemanFaddeeva reference = new WeidemanFaddeeva(64);
        double worst = 0;
        for (double r : new double[] {8.0, 9.5, 12.0, 25.0, 60.0}) {
            for (double angle = 0.001; angle < Math.PI / 2; angle += 0.05) {
                double x = r * Math.cos(angle);
                double y = r * Math.sin(angle);
                ComplexValue a = fraction.value(x, y);
                ComplexValue b = reference.value(x, y);
                worst = Math.max(worst, a.relativeDistance(b));
            }
        }
        assertTrue(worst < 1e-8, "worst relative difference " + worst);
    }
}
