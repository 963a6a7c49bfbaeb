package org.tracegas.qa.uncertainty;

import org.tracegas.qa.internal.Require;

/**
 * The inputs of the conversion of a wet FTIR value to the reporting basis, with their standard uncertainties:
 * the water vapour fraction h used for wet-to-dry, c_dry = c_wet / (1 − h), and the oxygen of the side
 * channel used for the reference-oxygen correction, E = E_dry · (21 − O2_ref) / (21 − O2_dry) (2010/75/EU
 * Annex VI, recalled from memory). An O2 analyser on wet gas gives O2_dry = O2_wet / (1 − h), so that
 * E = c_wet · (21 − O2_ref) / (21 (1 − h) − O2_wet) and h enters twice.
 *
 * @param h2oFraction       h, volume fraction 0 <= h < 1
 * @param h2oUncertainty    u(h), volume fraction
 * @param o2Percent         measured O2 in % vol, on the gas given by {@code o2OnWetGas}; ignored without reference
 * @param o2Uncertainty     u(O2) in % vol
 * @param o2OnWetGas        whether the O2 analyser sees wet gas
 * @param o2ReferencePercent reference O2 in % vol, or NaN for a basis without oxygen correction
 */
public record BasisConversion(double h2oFraction, double h2oUncertainty, double o2Percent, double o2Uncertainty,
        boolean o2OnWetGas, double o2ReferencePercent) {

    private static final double AIR_O2 = 21.0;

    public BasisConversion {
        if (!(h2oFraction >= 0 && h2oFraction < 1)) {
            throw new IllegalArgumentException("h2oFraction must lie in [0, 1), was " + h2oFraction);
        }
        Require.nonNegative("h2oUncertainty", h2oUncertainty);
        // the parameter, not the accessor: fields are assigned after this block
        if (!Double.isNaN(o2ReferencePercent)) {
            if (!(o2ReferencePercent >= 0 && o2ReferencePercent < AIR_O2)) {
                throw new IllegalArgumentException("o2ReferencePercent must lie in [0, 21), was " + o2ReferencePercent);
            }
            Require.nonNegative("o2Uncertainty", o2Uncertainty);
            if (!(o2Percent >= 0 && oxygenDenominator(h2oFraction, o2Percent, o2OnWetGas) > 0)) {
                throw new IllegalArgumentException("o2Percent must be at least 0 and below 21 % on dry gas, was "
                        + o2Percent + (o2OnWetGas ? " % on wet gas with h2oFraction " + h2oFraction : " %"));
            }
        }
    }

    /** Wet-to-dry only, without oxygen correction. */
    public static BasisConversion dryOnly(double h2oFraction, double h2oUncertainty) {
        return new BasisConversion(h2oFraction, h2oUncertainty, 0, 0, false, Double.NaN);
    }

    public boolean hasOxygenCorrection() {
        return !Double.isNaN(o2ReferencePercent);
    }

    /** F with E = c_wet · F. */
    public double factor() {
        if (!hasOxygenCorrection()) {
            return 1 / (1 - h2oFraction);
        }
        double d = oxygenDenominator(h2oFraction, o2Percent, o2OnWetGas);
        return (AIR_O2 - o2ReferencePercent) / (o2OnWetGas ? d : (1 - h2oFraction) * d);
    }

    /** ∂E/∂h divided by E: 1/(1 − h), or 21/(21(1 − h) − O2_wet) for an analyser on wet gas. */
    public double relativeH2oSensitivity() {
        if (hasOxygenCorrection() && o2OnWetGas) {
            return AIR_O2 / oxygenDenominator(h2oFraction, o2Percent, true);
        }
        return 1 / (1 - h2oFraction);
    }

    /** ∂E/∂O2 divided by E: 1/(21 − O2_dry), or 1/(21(1 − h) − O2_wet) on wet gas; 0 without correction. */
    public double relativeO2Sensitivity() {
        return hasOxygenCorrection() ? 1 / oxygenDenominator(h2oFraction, o2Percent, o2OnWetGas) : 0;
    }

    // 21 − O2_dry for a dry analyser, 21 (1 − h) − O2_wet for a wet one: the factor's O2-dependent denominator
    private static double oxygenDenominator(double h, double o2, boolean wet) {
        return wet ? AIR_O2 * (1 - h) - o2 : AIR_O2 - o2;
    }
}
