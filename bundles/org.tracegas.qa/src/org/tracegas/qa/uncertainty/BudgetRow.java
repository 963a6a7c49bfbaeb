package org.tracegas.qa.uncertainty;

/**
 * One line of an uncertainty budget table.
 *
 * @param name                input quantity
 * @param estimate            x_i
 * @param standardUncertainty u(x_i)
 * @param unit                unit of x_i
 * @param sensitivity         c_i
 * @param contribution        |c_i·u(x_i)| in the unit of the result
 * @param sharePercent        (c_i·u(x_i))² / Σ(c_j·u(x_j))² · 100, the share of the uncorrelated variance
 */
public record BudgetRow(String name, double estimate, double standardUncertainty, String unit, double sensitivity,
        double contribution, double sharePercent) {
}
