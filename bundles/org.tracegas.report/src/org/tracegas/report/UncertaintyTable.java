package org.tracegas.report;

import java.util.List;

import org.tracegas.qa.uncertainty.BudgetRow;
import org.tracegas.qa.uncertainty.UncertaintyBudget;
import org.tracegas.report.internal.Check;

/**
 * One GUM uncertainty budget as the report shows it: a row per input with estimate, standard uncertainty,
 * sensitivity coefficient, contribution and share, and the combined and expanded uncertainty.
 *
 * @param title     what the budget is of, for example "CO at 45.2 ppm (basis)"
 * @param value     the result y
 * @param unit      its unit
 * @param rows      one row per input, in input order
 * @param combined  u_c(y)
 * @param coverage  coverage factor k
 * @param expanded  U = k·u_c(y)
 */
public record UncertaintyTable(String title, double value, String unit, List<BudgetRow> rows, double combined,
        double coverage, double expanded) {

    public UncertaintyTable {
        Check.text("budget title", title);
        Check.notNull("unit", unit);
        rows = Check.list("rows", rows);
        if (rows.isEmpty()) {
            throw new IllegalArgumentException("budget " + title + " needs at least one row");
        }
    }

    public static UncertaintyTable of(String title, UncertaintyBudget b) {
        Check.notNull("budget", b);
        return new UncertaintyTable(title, b.value(), b.unit(), b.rows(), b.combinedStandardUncertainty(),
                b.coverageFactor(), b.expandedUncertainty());
    }
}
