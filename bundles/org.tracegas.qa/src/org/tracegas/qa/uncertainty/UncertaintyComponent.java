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
 */
public record UncertaintyComponent(String name, double estimate, double standardUncertainty, double sensitivity,
        String unit) {

    public UncertaintyComponent {
        Require.text("name", name);
        Require.finite("estimate of " + name, estimate);
        Require.nonNegative("standard uncertainty of " + name, standardUncertainty);
        Require.finite("sensitivity of " + name, sensitivity);
        Require.notNull("unit", unit);
    }

    /** Contribution u_i(y) = c_i·u(x_i), with sign. */
    public double contribution() {
        return sensitivity * standardUncertainty;
    }
}
