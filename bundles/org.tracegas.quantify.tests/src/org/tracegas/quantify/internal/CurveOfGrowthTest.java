package org.tracegas.quantify.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class CurveOfGrowthTest {

    private static final double STEP = 0.5;

    /**
     * Apparent absorbance at the centre of an isolated Lorentz line seen through a Gaussian instrument line shape,
     * from the Beer-Lambert law applied before the instrument: -log10 of the line-shape average of exp(-tau u).
     */
    private static double apparent(double peakTau, double u) {
        double gamma = 0.08;
        double sigma = 0.42;
        double sum = 0;
        double norm = 0;
        for (double d = -3; d <= 3; d += 0.002) {
            double g = Math.exp(-0.5 * (d / sigma) * (d / sigma));
            sum += g * Math.exp(-peakTau * u / (1 + (d / gamma) * (d / gamma)));
            norm += g;
        }
        return -Math.log10(sum / norm);
    }

    private static CurveOfGrowth curve(double[] amounts, double[] perAmount) {
        int m = amounts.length;
        double[][] absorbance = new double[m][];
        double[] first = new double[m];
        double[] step = new double[m];
        for (int i = 0; i < m; i++) {
            absorbance[i] = new double[] {0, perAmount[i], 0, 0};
            first[i] = 2000;
            step[i] = STEP;
        }
        return new CurveOfGrowth("CO", amounts, first, step, absorbance);
    }

    private static double at(CurveOfGrowth c, double[][] coefficients, double u) {
        double a = 0;
        for (int p = 0; p < CurveOfGrowth.TERMS; p++) {
            a += coefficients[p][0] * c.shape(p, u);
        }
        return a;
    }

    /**
     * A line of peak optical depth 6 at the highest reference (deep saturation): between references at a quarter,
     * a half and the whole, the curve reproduces the physics within 1 % of the highest reference's absorbance, and
     * passes through each reference.
     */
    @Test
    void followsSaturatingLineBetweenReferences() {
        double[] amounts = {100, 200, 400};
        double[] a = new double[3];
        for (int i = 0; i < 3; i++) {
            a[i] = apparent(6, amounts[i] / 400);
        }
        CurveOfGrowth c = curve(amounts, a);
        double[][] x = c.onPoints("test", new double[] {2000.5}, false)[0];
        for (int i = 0; i < 3; i++) {
            assertEquals(a[i], at(c, x, amounts[i] / 400), 1e-12);
        }
        for (double u = 0.02; u <= 1; u += 0.02) {
            assertEquals(apparent(6, u), at(c, x, u), 0.01 * a[2], "u " + u);
        }
    }

    /** References that fall with the amount at a point (noise on a weak point) still give a monotone curve. */
    @Test
    void lowersDegreeUntilMonotone() {
        CurveOfGrowth c = curve(new double[] {1, 2, 4}, new double[] {3e-4, -1e-4, 2e-4});
        double[][] x = c.onPoints("test", new double[] {2000.5}, false)[0];
        double previous = 0;
        for (double u = 0.01; u <= 1; u += 0.01) {
            double v = at(c, x, u);
            assertTrue(v >= previous, "falls at u " + u);
            previous = v;
        }
    }

    @Test
    void refusesPointOutsideReferences() {
        CurveOfGrowth c = curve(new double[] {1, 2}, new double[] {0.1, 0.2});
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> c.onPoints("fit of CO", new double[] {2003}, false));
        assertTrue(e.getMessage().contains("fit of CO") && e.getMessage().contains("2003"), e.getMessage());
    }
}
