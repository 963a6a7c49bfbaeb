package org.tracegas.quantify.internal;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.Random;

import org.junit.jupiter.api.Test;

class PointMajorVectorsTest {

    /**
     * Dot products worked by hand: small integers, whose products and sums doubles hold exactly (common practice,
     * no source). Five points: one block of four and one point on its own.
     */
    @Test
    void dotProductsWorkedByHand() {
        double[][] vectors = {{1, 2, 3, 4, 5}, {5, 4, 3, 2, 1}, {1, 0, -1, 0, 1}};
        double[] y = {1, 1, 2, 3, 5};
        double[] out = {99, 99, 99, 99};
        new PointMajorVectors(vectors, 5).dot(y, out);
        // 1 + 2 + 6 + 12 + 25; 5 + 4 + 6 + 6 + 5; 1 - 2 + 5
        assertArrayEquals(new double[] {46, 26, 4, 99}, out, 0);
    }

    /** Only the first {@code length} points count, and the values are read back by point and vector. */
    @Test
    void takesTheFirstPointsOnly() {
        PointMajorVectors v = new PointMajorVectors(new double[][] {{1, 2, 3}, {4, 5, 6}}, 2);
        double[] out = new double[2];
        v.dot(new double[] {10, 1, 1000}, out);
        assertArrayEquals(new double[] {12, 45}, out, 0);
        assertEquals(5, v.at(1, 1), 0);
        assertThrows(IllegalArgumentException.class, () -> new PointMajorVectors(new double[][] {{1}}, 2));
    }

    /**
     * Each sum takes its terms in point order: the same bits as the plain loop over the points, whatever the
     * rounding (the definition of the sum; rounding makes any other order differ in the last bits).
     */
    @Test
    void sameBitsAsThePlainLoopInPointOrder() {
        Random random = new Random(7);
        int count = 13;
        int length = 1003;
        double[][] vectors = new double[count][length];
        double[] y = new double[length];
        for (int j = 0; j < length; j++) {
            y[j] = random.nextGaussian() * Math.pow(10, random.nextInt(9) - 4);
            for (int k = 0; k < count; k++) {
                vectors[k][j] = random.nextGaussian() * Math.pow(10, random.nextInt(9) - 4);
            }
        }
        double[] out = new double[count];
        new PointMajorVectors(vectors, length).dot(y, out);
        for (int k = 0; k < count; k++) {
            double sum = 0;
            for (int j = 0; j < length; j++) {
                sum += vectors[k][j] * y[j];
            }
            assertEquals(Double.doubleToLongBits(sum), Double.doubleToLongBits(out[k]), "vector " + k);
        }
    }
}
