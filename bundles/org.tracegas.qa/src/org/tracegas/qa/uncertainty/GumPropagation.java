package org.tracegas.qa.uncertainty;

import java.util.ArrayList;
import java.util.List;

import org.tracegas.qa.internal.Require;

/**
 * Builds a budget from a measurement model, taking the sensitivity coefficients as central differences
 * c_i = (f(x + u_i e_i) − f(x − u_i e_i)) / 2u_i over plus and minus one standard uncertainty, the
 * numerical evaluation of JCGM 100:2008 5.1.3 (a note there; recalled from memory). For a model linear in
 * x_i this is the derivative; otherwise it averages the slope over x_i ± u_i.
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

    /** Central difference with step u; an exact input (u = 0) gets a small relative step instead. */
    static double sensitivity(MeasurementModel model, double[] x, int i, double u) {
        double h = u > 0 ? u : Math.max(Math.abs(x[i]), 1.0) * 1e-6;
        double[] plus = x.clone();
        double[] minus = x.clone();
        plus[i] += h;
        minus[i] -= h;
        return (model.value(plus) - model.value(minus)) / (plus[i] - minus[i]);
    }
}
