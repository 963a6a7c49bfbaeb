package org.tracegas.qa.uncertainty;

import java.util.ArrayList;
import java.util.List;

import org.tracegas.qa.internal.Require;

/**
 * Builds a budget from a measurement model, taking the sensitivity coefficients as central differences
 * ∂f/∂x_i ≈ (f(x + h e_i) − f(x − h e_i)) / 2h at the estimates.
 */
public final class GumPropagation {

    private GumPropagation() {
    }

    public static UncertaintyBudget budget(String quantity, String unit, MeasurementModel model, String[] names,
            double[] estimates, double[] uncertainties, String[] units) {
        Require.notNull("model", model);
        int n = Require.notNull("estimates", estimates).length;
        if (names.length != n || uncertainties.length != n || units.length != n) {
            throw new IllegalArgumentException("names, estimates, uncertainties and units must have the same length, "
                    + "were " + names.length + ", " + n + ", " + uncertainties.length + ", " + units.length);
        }
        List<UncertaintyComponent> components = new ArrayList<>(n);
        for (int i = 0; i < n; i++) {
            components.add(new UncertaintyComponent(names[i], estimates[i], uncertainties[i],
                    sensitivity(model, estimates, i, uncertainties[i]), units[i]));
        }
        return UncertaintyBudget.of(quantity, model.value(estimates.clone()), unit, components);
    }

    /** Central difference with a step small against the input's own uncertainty and magnitude. */
    static double sensitivity(MeasurementModel model, double[] x, int i, double u) {
        double h = u > 0 ? u * 1e-3 : Math.max(Math.abs(x[i]), 1.0) * 1e-6;
        double[] plus = x.clone();
        double[] minus = x.clone();
        plus[i] += h;
        minus[i] -= h;
        return (model.value(plus) - model.value(minus)) / (plus[i] - minus[i]);
    }
}
