package org.tracegas.qa.basis;

import org.tracegas.qa.internal.Require;

/** Wet-to-dry conversion with the water vapour volume fraction that the FTIR measures in the same gas. */
public final class MoistureCorrection {

    private MoistureCorrection() {
    }

    /**
     * c_dry = c_wet / (1 − x_H2O).
     *
     * @param h2oFraction water vapour volume fraction, 0 <= x < 1 (0.15 for 15 %)
     */
    public static double toDry(double wetValue, double h2oFraction) {
        Require.finite("wetValue", wetValue);
        if (!(h2oFraction >= 0 && h2oFraction < 1)) {
            throw new IllegalArgumentException("h2oFraction must lie in [0, 1), was " + h2oFraction);
        }
        return wetValue / (1 - h2oFraction);
    }
}
