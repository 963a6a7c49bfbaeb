package org.tracegas.quantify.internal;

import java.util.Arrays;

/**
 * Many vectors of one length kept point by point (all vectors' values at point 0, then at point 1, ...), for the
 * dot products of all of them with one sample vector.
 * <p>
 * Why this layout: kept vector by vector, each dot product is a sum over the points that the compiler cannot turn
 * into vector instructions without reordering it, so every value costs a load of its own. Point by point, the
 * products become one update of all sums per point, which the compiler does with vector instructions; each sum
 * still adds its terms in plain point order, so the results are the same to the last bit as a loop over the
 * points.
 */
final class PointMajorVectors {

    private final int count;
    private final double[][] values; // [point][vector]

    /**
     * @param vectors the vectors, each at least {@code length} long; copied
     * @param length  points per vector
     * @throws IllegalArgumentException if a vector is shorter than {@code length}
     */
    PointMajorVectors(double[][] vectors, int length) {
        this.count = vectors.length;
        this.values = new double[length][count];
        for (int k = 0; k < count; k++) {
            if (vectors[k].length < length) {
                throw new IllegalArgumentException("vector " + k + " has " + vectors[k].length + " values, fewer than "
                        + length + " points");
            }
            for (int j = 0; j < length; j++) {
                values[j][k] = vectors[k][j];
            }
        }
    }

    /** Value of vector k at point j. */
    double at(int j, int k) {
        return values[j][k];
    }

    /**
     * out[k] = vector k . y over the points, each sum in point order.
     *
     * @param y   at least as long as the vectors
     * @param out at least as long as the number of vectors; overwritten
     */
    void dot(double[] y, double[] out) {
        Arrays.fill(out, 0, count, 0);
        int length = values.length;
        int j = 0;
        // four points per update of the sums: a quarter of the loads and stores of the sums; left to right, so each
        // sum still takes its terms one after the other in point order. One array per point: the compiler vectorizes
        // loads from separate arrays, not from one array at several offsets.
        for (; j + 4 <= length; j += 4) {
            double y0 = y[j];
            double y1 = y[j + 1];
            double y2 = y[j + 2];
            double y3 = y[j + 3];
            double[] v0 = values[j];
            double[] v1 = values[j + 1];
            double[] v2 = values[j + 2];
            double[] v3 = values[j + 3];
            for (int k = 0; k < count; k++) {
                out[k] = out[k] + v0[k] * y0 + v1[k] * y1 + v2[k] * y2 + v3[k] * y3;
            }
        }
        for (; j < length; j++) {
            double yj = y[j];
            double[] v = values[j];
            for (int k = 0; k < count; k++) {
                out[k] += v[k] * yj;
            }
        }
    }
}
