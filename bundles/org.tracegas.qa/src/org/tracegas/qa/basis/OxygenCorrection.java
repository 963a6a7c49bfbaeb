package org.tracegas.qa.basis;

import java.util.Locale;

import org.tracegas.qa.internal.Require;

/**
 * Correction of an emission concentration to a reference oxygen content:
 * E_ref = E_meas · (21 − O2_ref) / (21 − O2_meas), with dry-gas O2 in volume percent. Near 21 % the factor
 * grows without bound, so measured O2 at or above a guard value is rejected.
 */
public final class OxygenCorrection {

    /** Oxygen content of dry air, in volume percent, as the correction formula uses it. */
    public static final double AIR_O2_PERCENT = 21.0;

    private final double referencePercent;
    private final double guardPercent;

    /**
     * @param referencePercent reference O2, for example 11 (waste incineration) or 10 (cement kilns)
     * @param guardPercent     measured O2 at or above which no corrected value is given, below 21
     */
    public OxygenCorrection(double referencePercent, double guardPercent) {
        if (!(referencePercent >= 0 && referencePercent < AIR_O2_PERCENT)) {
            throw new IllegalArgumentException("referencePercent must lie in [0, 21), was " + referencePercent);
        }
        if (!(guardPercent > 0 && guardPercent < AIR_O2_PERCENT)) {
            throw new IllegalArgumentException("guardPercent must lie in (0, 21), was " + guardPercent);
        }
        this.referencePercent = referencePercent;
        this.guardPercent = guardPercent;
    }

    public double referencePercent() {
        return referencePercent;
    }

    /** Whether a measured O2 value lies below the guard, so that a corrected value can be given. */
    public boolean canCorrect(double measuredPercent) {
        return measuredPercent >= 0 && measuredPercent < guardPercent;
    }

    /**
     * @throws IllegalArgumentException if the measured O2 is negative or at or above the guard
     */
    public double correct(double measuredValue, double measuredPercent) {
        Require.finite("measuredValue", measuredValue);
        if (!canCorrect(measuredPercent)) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "measured O2 must lie in [0, %.3g) %% for the reference-oxygen correction, was %s",
                    guardPercent, measuredPercent));
        }
        return measuredValue * (AIR_O2_PERCENT - referencePercent) / (AIR_O2_PERCENT - measuredPercent);
    }
}
