package org.tracegas.quantify.internal;

import org.apache.commons.math3.linear.MatrixUtils;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.SingularValueDecomposition;

/**
 * A linear least-squares design, decomposed once so that each right-hand side costs two passes over one matrix.
 * <p>
 * The columns are scaled to unit norm and the scaled, weighted matrix X' = U S V^T is split by a singular value
 * decomposition (Commons Math). Kept are the orthonormal basis U, the small map V S^-1 D^-1 from U^T y to the
 * coefficients (together the pseudo-inverse, in factored form) and the unscaled covariance (X^T W X)^-1. A sample
 * then costs z = U^T y, c = V S^-1 D^-1 z and the residual y - U z: an orthogonal projection, accurate even where
 * the fit is close, and one matrix in cache instead of two. Scaling first keeps badly scaled columns (a polynomial
 * in wavenumber next to a band of absorbance 1e-3) from costing digits; the singular values guard against a design
 * whose columns cannot be told apart.
 */
public final class LinearDesign {

    /**
     * Reciprocal condition number of the scaled design below which it is refused: with double precision and
     * absorbance noise around 1e-4, concentrations of such a design carry no useful digit (common practice, no
     * source).
     */
    public static final double MIN_RECIPROCAL_CONDITION = 1e-12;

    private final int rows;
    private final int cols;
    private final double[][] basis;       // [k][row]: orthonormal basis U of the weighted design's column space
    private final double[][] toCoefficients; // [col][k]: c = V S^-1 D^-1 (U^T W^1/2 y)
    private final double[][] covariance;  // (X^T W X)^-1
    private final double[] sqrtWeights;   // null: all 1
    private final double reciprocalCondition;

    private LinearDesign(double[][] columns, double[] weights, String what) {
        this.cols = columns.length;
        if (cols == 0) {
            throw new IllegalArgumentException(what + " has no columns");
        }
        this.rows = columns[0].length;
        if (rows <= cols) {
            throw new IllegalArgumentException(what + " has " + rows + " points for " + cols
                    + " coefficients; it needs more points than coefficients");
        }
        for (int j = 0; j < cols; j++) {
            if (columns[j].length != rows) {
                throw new IllegalArgumentException(what + ": column " + j + " has " + columns[j].length
                        + " points, column 0 has " + rows);
            }
        }
        if (weights != null && weights.length != rows) {
            throw new IllegalArgumentException(what + ": " + weights.length + " weights for " + rows + " points");
        }
        double[] sqrtW = new double[rows];
        for (int i = 0; i < rows; i++) {
            sqrtW[i] = weights == null ? 1.0 : Math.sqrt(weights[i]);
        }
        double[] norm = new double[cols];
        double[][] scaled = new double[rows][cols];
        for (int j = 0; j < cols; j++) {
            double sum = 0;
            for (int i = 0; i < rows; i++) {
                double v = columns[j][i] * sqrtW[i];
                sum += v * v;
            }
            norm[j] = Math.sqrt(sum);
            if (!(norm[j] > 0 && Double.isFinite(norm[j]))) {
                throw new IllegalArgumentException(what + ": column " + j + " is zero or not finite in the fit range");
            }
            for (int i = 0; i < rows; i++) {
                scaled[i][j] = columns[j][i] * sqrtW[i] / norm[j];
            }
        }
        SingularValueDecomposition svd = new SingularValueDecomposition(MatrixUtils.createRealMatrix(scaled));
        double[] s = svd.getSingularValues();
        this.reciprocalCondition = s[cols - 1] / s[0];
        if (!(reciprocalCondition > MIN_RECIPROCAL_CONDITION)) {
            throw new IllegalArgumentException(what + " has columns that cannot be told apart (reciprocal condition "
                    + reciprocalCondition + ")");
        }
        double[][] u = svd.getU().getData();      // rows x cols
        double[][] v = svd.getV().getData();      // cols x cols
        double[][] vs = new double[cols][cols];
        this.toCoefficients = new double[cols][cols];
        for (int j = 0; j < cols; j++) {
            for (int k = 0; k < cols; k++) {
                vs[j][k] = v[j][k] / s[k];
                toCoefficients[j][k] = vs[j][k] / norm[j];
            }
        }
        this.basis = new double[cols][rows];
        for (int i = 0; i < rows; i++) {
            for (int k = 0; k < cols; k++) {
                basis[k][i] = u[i][k];
            }
        }
        this.sqrtWeights = weights == null ? null : sqrtW;
        this.covariance = new double[cols][cols];
        for (int j = 0; j < cols; j++) {
            for (int l = 0; l < cols; l++) {
                double sum = 0;
                for (int k = 0; k < cols; k++) {
                    sum += vs[j][k] * vs[l][k];
                }
                covariance[j][l] = sum / (norm[j] * norm[l]);
            }
        }
    }

    /**
     * @param columns design columns, [column][point]; copied
     * @param weights weight per point, or null for equal weights
     * @param what    names the design in error messages
     * @throws IllegalArgumentException if the design has too few points, a zero column or columns that cannot be
     *                                  told apart
     */
    public static LinearDesign of(double[][] columns, double[] weights, String what) {
        return new LinearDesign(columns, weights, what);
    }

    public int rows() {
        return rows;
    }

    public int columns() {
        return cols;
    }

    public double reciprocalCondition() {
        return reciprocalCondition;
    }

    /** Solves for one right-hand side of {@link #rows()} values. */
    public LinearSolution solve(double[] y) {
        if (y.length != rows) {
            throw new IllegalArgumentException("right-hand side has " + y.length + " values, design has " + rows);
        }
        double[] yw = y;
        if (sqrtWeights != null) {
            yw = new double[rows];
            for (int i = 0; i < rows; i++) {
                yw[i] = y[i] * sqrtWeights[i];
            }
        }
        // projection onto the orthonormal basis: z = U^T y_w, then residual_w = y_w - U z
        double[] z = new double[cols];
        DotProducts.of(basis, yw, rows, z);
        double[] c = new double[cols];
        for (int j = 0; j < cols; j++) {
            double sum = 0;
            for (int k = 0; k < cols; k++) {
                sum += toCoefficients[j][k] * z[k];
            }
            c[j] = sum;
        }
        double[] residual = yw.clone();
        for (int k = 0; k < cols; k++) {
            double[] uk = basis[k];
            double zk = z[k];
            for (int i = 0; i < rows; i++) {
                residual[i] -= zk * uk[i];
            }
        }
        double rss = 0;
        for (int i = 0; i < rows; i++) {
            rss += residual[i] * residual[i];
        }
        if (sqrtWeights != null) {
            for (int i = 0; i < rows; i++) {
                residual[i] /= sqrtWeights[i];
            }
        }
        return new LinearSolution(c, residual, rss, rows - cols, covariance);
    }

    /** (X^T W X)^-1, the covariance of the coefficients per unit residual variance. */
    public double[][] unscaledCovariance() {
        double[][] copy = new double[cols][];
        for (int j = 0; j < cols; j++) {
            copy[j] = covariance[j].clone();
        }
        return copy;
    }
}
