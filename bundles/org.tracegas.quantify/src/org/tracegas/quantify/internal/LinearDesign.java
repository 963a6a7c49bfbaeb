package org.tracegas.quantify.internal;

import org.apache.commons.math3.linear.MatrixUtils;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.SingularValueDecomposition;

/**
 * A linear least-squares design, decomposed once so that each right-hand side costs two matrix-vector products.
 * <p>
 * The columns are scaled to unit norm and the scaled, weighted matrix is split by a singular value decomposition
 * (Commons Math); the pseudo-inverse rows and the unscaled covariance (X^T W X)^-1 are kept. Scaling first keeps
 * badly scaled columns (a polynomial in wavenumber next to a band of absorbance 1e-3) from costing digits; the
 * singular values guard against a design whose columns cannot be told apart.
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
    private final double[][] columns;     // [col][row], unweighted
    private final int[] support;          // per column: first and one past the last non-zero row (2 per column)
    private final double[][] pseudoInverse; // [col][row], weights folded in: c = P y
    private final double[][] covariance;  // (X^T W X)^-1
    private final double[] weights;       // null: all 1
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
        this.columns = new double[cols][];
        for (int j = 0; j < cols; j++) {
            if (columns[j].length != rows) {
                throw new IllegalArgumentException(what + ": column " + j + " has " + columns[j].length
                        + " points, column 0 has " + rows);
            }
            this.columns[j] = columns[j].clone();
        }
        this.support = new int[2 * cols];
        for (int j = 0; j < cols; j++) {
            // baseline columns live on their own region only; skipping their zeros saves work per sample
            int from = 0;
            int to = rows;
            while (from < to && this.columns[j][from] == 0) {
                from++;
            }
            while (to > from && this.columns[j][to - 1] == 0) {
                to--;
            }
            support[2 * j] = from;
            support[2 * j + 1] = to;
        }
        this.weights = weights == null ? null : weights.clone();
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
        this.pseudoInverse = new double[cols][rows];
        double[][] vs = new double[cols][cols];
        for (int j = 0; j < cols; j++) {
            for (int k = 0; k < cols; k++) {
                vs[j][k] = v[j][k] / s[k];
            }
        }
        for (int j = 0; j < cols; j++) {
            double[] p = pseudoInverse[j];
            for (int i = 0; i < rows; i++) {
                double sum = 0;
                double[] ui = u[i];
                for (int k = 0; k < cols; k++) {
                    sum += vs[j][k] * ui[k];
                }
                p[i] = sum * sqrtW[i] / norm[j];
            }
        }
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
        double[] c = new double[cols];
        int j = 0;
        // four rows at a time: four independent sums keep the processor busy, each summed in plain row order
        for (; j + 4 <= cols; j += 4) {
            double[] p0 = pseudoInverse[j];
            double[] p1 = pseudoInverse[j + 1];
            double[] p2 = pseudoInverse[j + 2];
            double[] p3 = pseudoInverse[j + 3];
            double s0 = 0;
            double s1 = 0;
            double s2 = 0;
            double s3 = 0;
            for (int i = 0; i < rows; i++) {
                double yi = y[i];
                s0 += p0[i] * yi;
                s1 += p1[i] * yi;
                s2 += p2[i] * yi;
                s3 += p3[i] * yi;
            }
            c[j] = s0;
            c[j + 1] = s1;
            c[j + 2] = s2;
            c[j + 3] = s3;
        }
        for (; j < cols; j++) {
            double[] p = pseudoInverse[j];
            double sum = 0;
            for (int i = 0; i < rows; i++) {
                sum += p[i] * y[i];
            }
            c[j] = sum;
        }
        double[] residual = y.clone();
        for (j = 0; j < cols; j++) {
            double[] x = columns[j];
            double cj = c[j];
            for (int i = support[2 * j], to = support[2 * j + 1]; i < to; i++) {
                residual[i] -= cj * x[i];
            }
        }
        double rss = 0;
        for (int i = 0; i < rows; i++) {
            double r = residual[i];
            rss += weights == null ? r * r : weights[i] * r * r;
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
