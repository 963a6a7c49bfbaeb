package org.tracegas.preprocess.internal;

import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.QRDecomposition;
import org.apache.commons.math3.linear.SingularMatrixException;

/**
 * Linear least squares by Householder QR of the design matrix (not the normal equations, which square the
 * condition number).
 */
public final class LeastSquares {

    private LeastSquares() {
    }

    /**
     * Minimises |design b - y|.
     *
     * @param design one row per observation, one column per coefficient
     * @param y      observations
     * @return the coefficients b
     * @throws IllegalArgumentException if there are fewer observations than coefficients or the columns are
     *                                  linearly dependent
     */
    public static double[] solve(double[][] design, double[] y) {
        int rows = design.length;
        int columns = rows == 0 ? 0 : design[0].length;
        if (rows < columns || columns == 0) {
            throw new IllegalArgumentException("least squares needs at least as many observations as coefficients: "
                    + rows + " observations, " + columns + " coefficients");
        }
        try {
            return new QRDecomposition(new Array2DRowRealMatrix(design, false), 0.0).getSolver()
                    .solve(new ArrayRealVector(y, false)).toArray();
        } catch (SingularMatrixException e) {
            throw new IllegalArgumentException("least squares design matrix of " + rows + " x " + columns
                    + " is rank deficient", e);
        }
    }
}
