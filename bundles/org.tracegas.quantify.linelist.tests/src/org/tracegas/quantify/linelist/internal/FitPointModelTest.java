package org.tracegas.quantify.linelist.internal;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.linear.RealMatrix;
import org.junit.jupiter.api.Test;

class FitPointModelTest {

    /** Fit points every 0.25 cm-1 over 2130-2150 cm-1, in the band of {@link MixtureModelTest#band()}. */
    private static final double[] NU = new double[81];
    /** A constant and a linear baseline term. */
    private static final double[][] BASELINE = new double[2][NU.length];
    private static final int[] ROWS = new int[NU.length];

    static {
        for (int j = 0; j < NU.length; j++) {
            NU[j] = 2130 + 0.25 * j;
            BASELINE[0][j] = 1;
            BASELINE[1][j] = (NU[j] - 2140) / 10;
            ROWS[j] = j;
        }
    }

    private static FitPointModel model(MixtureModel mixture) {
        return new FitPointModel(mixture, NU, BASELINE, ROWS, true);
    }

    /**
     * Each Jacobian column against central differences of the values (the definition of the derivative; steps
     * small against each parameter's scale): amount, both baseline terms and the wavenumber scale, the band deep
     * enough that its strongest lines let through less than half the light.
     */
    @Test
    void jacobianIsThatOfCentralDifferences() {
        MixtureModel mixture = MixtureModelTest.model(0.006);
        double[] theta = {2500, 0.01, -0.002, 3e-5};
        double[] steps = {0.01, 1e-6, 1e-6, 1e-9};
        RealMatrix jacobian = model(mixture).computeJacobian(theta);
        double deepest = 0;
        for (double v : model(mixture).computeValue(theta).toArray()) {
            deepest = Math.max(deepest, v);
        }
        assertTrue(deepest > 0.3, "the band must absorb strongly, highest absorbance " + deepest);
        for (int q = 0; q < theta.length; q++) {
            double[] up = theta.clone();
            double[] down = theta.clone();
            up[q] += steps[q];
            down[q] -= steps[q];
            double[] vUp = model(mixture).computeValue(up).toArray();
            double[] vDown = model(mixture).computeValue(down).toArray();
            double largest = 0;
            for (int k = 0; k < NU.length; k++) {
                largest = Math.max(largest, Math.abs(jacobian.getEntry(k, q)));
            }
            assertTrue(largest > 0, "column " + q + " must not vanish");
            for (int k = 0; k < NU.length; k++) {
                double numeric = (vUp[k] - vDown[k]) / (2 * steps[q]);
                assertEquals(numeric, jacobian.getEntry(k, q), 1e-6 * largest, "column " + q + ", point " + k);
            }
        }
    }

    /**
     * Values remembered from earlier points and a Jacobian asked after other points were evaluated are, to the
     * last bit, those of a model that never saw any other point: the optimizer may come back to a point.
     */
    @Test
    void anOrderOfQuestionsGivesTheSameNumbers() {
        MixtureModel mixture = MixtureModelTest.model(0.006);
        double[] first = {800, 0.01, 0, 1e-5};
        double[] second = {900, 0.02, 0.001, -1e-5};
        FitPointModel busy = model(mixture);
        double[] firstValues = busy.computeValue(first).toArray();
        busy.computeValue(second);
        assertArrayEquals(firstValues, busy.computeValue(first).toArray(), 0);
        RealMatrix firstJacobian = busy.computeJacobian(first);
        busy.computeValue(second);
        RealMatrix secondJacobian = busy.computeJacobian(second);

        assertArrayEquals(model(mixture).computeValue(first).toArray(), firstValues, 0);
        double[][] freshFirst = model(mixture).computeJacobian(first).getData();
        double[][] freshSecond = model(mixture).computeJacobian(second).getData();
        for (int k = 0; k < NU.length; k++) {
            assertArrayEquals(freshFirst[k], firstJacobian.getRow(k), 0, "point " + k);
            assertArrayEquals(freshSecond[k], secondJacobian.getRow(k), 0, "point " + k);
        }
    }
}
