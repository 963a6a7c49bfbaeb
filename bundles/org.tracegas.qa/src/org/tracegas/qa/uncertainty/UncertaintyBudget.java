package org.tracegas.qa.uncertainty;

import java.util.ArrayList;
import java.util.List;
import java.util.function.Predicate;

import org.tracegas.qa.internal.Require;
import org.tracegas.qa.internal.StudentT;

/**
 * Immutable GUM uncertainty budget of one result y: u_c²(y) = Σ c_i²u_i² + 2 Σ_{i<j} c_i c_j u_i u_j r_ij
 * (JCGM 100:2008, 5.1.2 and 5.2.2), expanded uncertainty U = k·u_c (6.2.1).
 */
public final class UncertaintyBudget {

    private final String quantity;
    private final double value;
    private final String unit;
    private final List<UncertaintyComponent> components;
    private final double[][] correlation; // null: uncorrelated inputs
    private final double coverageFactor;

    private UncertaintyBudget(String quantity, double value, String unit, List<UncertaintyComponent> components,
            double[][] correlation, double coverageFactor) {
        this.quantity = quantity;
        this.value = value;
        this.unit = unit;
        this.components = components;
        this.correlation = correlation;
        this.coverageFactor = coverageFactor;
    }

    /** A budget of uncorrelated inputs with coverage factor k = 2. */
    public static UncertaintyBudget of(String quantity, double value, String unit,
            List<UncertaintyComponent> components) {
        return of(quantity, value, unit, components, null, 2.0);
    }

    /**
     * @param correlation symmetric matrix of correlation coefficients r_ij with unit diagonal, or null for
     *                    uncorrelated inputs; copied
     * @param coverageFactor k > 0
     */
    public static UncertaintyBudget of(String quantity, double value, String unit,
            List<UncertaintyComponent> components, double[][] correlation, double coverageFactor) {
        Require.text("quantity", quantity);
        Require.finite("value", value);
        Require.notNull("unit", unit);
        if (components == null || components.isEmpty()) {
            throw new IllegalArgumentException("components must hold at least one input");
        }
        Require.positive("coverageFactor", coverageFactor);
        return new UncertaintyBudget(quantity, value, unit, List.copyOf(components),
                correlation == null ? null : checkedCopy(correlation, components.size()), coverageFactor);
    }

    private static double[][] checkedCopy(double[][] r, int n) {
        if (r.length != n) {
            throw new IllegalArgumentException("correlation matrix has " + r.length + " rows for " + n + " components");
        }
        double[][] copy = new double[n][];
        for (int i = 0; i < n; i++) {
            if (r[i] == null || r[i].length != n) {
                throw new IllegalArgumentException("correlation row " + i + " must have " + n + " entries");
            }
            copy[i] = r[i].clone();
        }
        for (int i = 0; i < n; i++) {
            if (copy[i][i] != 1.0) {
                throw new IllegalArgumentException("correlation r[" + i + "][" + i + "] must be 1, was " + copy[i][i]);
            }
            for (int j = 0; j < n; j++) {
                if (!(Math.abs(copy[i][j]) <= 1) || copy[i][j] != copy[j][i]) {
                    throw new IllegalArgumentException("correlation r[" + i + "][" + j + "] = " + copy[i][j]
                            + " must lie in [-1, 1] and equal r[" + j + "][" + i + "]");
                }
            }
        }
        return copy;
    }

    public String quantity() {
        return quantity;
    }

    public double value() {
        return value;
    }

    public String unit() {
        return unit;
    }

    public List<UncertaintyComponent> components() {
        return components;
    }

    public double coverageFactor() {
        return coverageFactor;
    }

    /** The same budget with another coverage factor. */
    public UncertaintyBudget withCoverageFactor(double k) {
        return of(quantity, value, unit, components, correlation, k);
    }

    /** u_c(y). */
    public double combinedStandardUncertainty() {
        return combinedStandardUncertainty(c -> true);
    }

    /**
     * The part of u_c(y) from some of the inputs (with their correlations among themselves), for example the
     * random part that averages down over repeated results apart from the systematic part that does not.
     */
    public double combinedStandardUncertainty(Predicate<UncertaintyComponent> which) {
        int n = components.size();
        double variance = 0;
        for (int i = 0; i < n; i++) {
            if (!which.test(components.get(i))) {
                continue;
            }
            double ci = components.get(i).contribution();
            variance += ci * ci;
            if (correlation != null) {
                for (int j = i + 1; j < n; j++) {
                    if (which.test(components.get(j))) {
                        variance += 2 * ci * components.get(j).contribution() * correlation[i][j];
                    }
                }
            }
        }
        if (variance < 0) {
            throw new IllegalStateException("the correlation matrix gives a negative variance " + variance);
        }
        return Math.sqrt(variance);
    }

    /**
     * Effective degrees of freedom by the Welch-Satterthwaite formula, nu_eff = u_c^4 / sum (c_i u_i)^4 / nu_i
     * (JCGM 100:2008 G.4.1), for uncorrelated inputs; positive infinity when every input has infinite degrees
     * of freedom.
     *
     * @throws IllegalStateException for a budget with correlated inputs, where the formula does not hold
     */
    public double effectiveDegreesOfFreedom() {
        if (correlation != null) {
            throw new IllegalStateException("the Welch-Satterthwaite formula needs uncorrelated inputs; the budget of "
                    + quantity + " has a correlation matrix");
        }
        double uc = combinedStandardUncertainty();
        double denominator = 0;
        for (UncertaintyComponent c : components) {
            if (Double.isFinite(c.degreesOfFreedom())) {
                double ui = c.contribution();
                denominator += ui * ui * ui * ui / c.degreesOfFreedom();
            }
        }
        return denominator == 0 ? Double.POSITIVE_INFINITY : uc * uc * uc * uc / denominator;
    }

    /**
     * The coverage factor of a coverage probability from the t distribution with the effective degrees of
     * freedom, k_p = t_p(nu_eff) (JCGM 100:2008 G.4.1, G.6.4), rounding nu_eff down as G.4.1 note 1 says.
     */
    public double coverageFactorFor(double probability) {
        double nu = effectiveDegreesOfFreedom();
        return StudentT.twoSidedQuantile(probability, Double.isInfinite(nu) ? nu : Math.max(1, Math.floor(nu)));
    }

    /** U = k·u_c(y). */
    public double expandedUncertainty() {
        return coverageFactor * combinedStandardUncertainty();
    }

    /** Relative expanded uncertainty U/|y| in percent. */
    public double relativeExpandedPercent() {
        return expandedUncertainty() / Math.abs(value) * 100.0;
    }

    /** Table-friendly view, one row per component in input order. */
    public List<BudgetRow> rows() {
        double sum = 0;
        for (UncertaintyComponent c : components) {
            sum += c.contribution() * c.contribution();
        }
        List<BudgetRow> rows = new ArrayList<>(components.size());
        for (UncertaintyComponent c : components) {
            double ui = c.contribution();
            rows.add(new BudgetRow(c.name(), c.estimate(), c.standardUncertainty(), c.unit(), c.sensitivity(),
                    Math.abs(ui), sum == 0 ? 0 : ui * ui / sum * 100.0));
        }
        return List.copyOf(rows);
    }
}
