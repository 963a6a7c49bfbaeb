package org.tracegas.qa.uncertainty;

import org.tracegas.qa.internal.Require;

/**
 * One input quantity of a measurement model.
 *
 * @param name                name of the input, for example "path length"
 * @param estimate            estimate x_i of the input
 * @param standardUncertainty u(x_i), non-negative
 * @param sensitivity         c_i = ∂f/∂x_i at the estimates
 * @param unit                unit of x_i and u(x_i)
 * @param degreesOfFreedom    nu_i of u(x_i): n - 1 for a Type A mean of n readings, positive infinity for a
 *                            Type B value taken as exactly known in its uncertainty (JCGM 100:2008 G.4.2)
 */
public record UncertaintyComponent(String name, double estimate, double standardUncertainty, double sensitivity,
        String unit, double degreesOfFreedom) {

    public UncertaintyComponent {
        Require.text("name", name);
        Require.finite("estimate of " + name, estimate);
        Require.nonNegative("standard uncertainty of " + name, standardUncertainty);
        Require.finite("sensitivity of " + name, sensitivity);
        Require.notNull("unit", unit);
        if (!(degreesOfFreedom >= 1)) {
            throw new IllegalArgumentException("degrees of freedom of " + name + " must be at least 1, was "
                    + degreesOfFreedom);
        }
    }

    /** An input whose uncertainty is taken as exactly known (infinite degrees of freedom). */
    public UncertaintyComponent(String name, double estimate, double standardUncertainty, double sensitivity,
            String unit) {
        this(name, estimate, standardUncertainty, sensitivity, unit, Double.POSITIVE_INFINITY);
    }

    /** Contribution u_i(y) = c_i·u(x_i), with sign. */
    public double contribution() {
        return sensitivity * standardUncertainty;
    }
}
