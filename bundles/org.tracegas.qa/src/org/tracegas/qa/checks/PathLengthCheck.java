package org.tracegas.qa.checks;

import org.tracegas.qa.internal.Format;
import org.tracegas.qa.internal.Require;

/**
 * Effective absorption path length from a CTS measurement against the CTS reference spectrum, judged
 * against the nominal path of the cell.
 */
public final class PathLengthCheck {

    /** Tolerance used in trade practice; no written figure was found for it. */
    public static final double COMMON_PRACTICE_TOLERANCE_PERCENT = 5.0;

    private final double nominalPathM;
    private final double tolerancePercent;

    /**
     * @param nominalPathM     nominal cell path in m
     * @param tolerancePercent accepted deviation of the effective from the nominal path, in percent
     */
    public PathLengthCheck(double nominalPathM, double tolerancePercent) {
        this.nominalPathM = Require.positive("nominalPathM", nominalPathM);
        this.tolerancePercent = Require.positive("tolerancePercent", tolerancePercent);
    }

    /**
     * Effective path L_s = L_r·(A_s/A_r)·(C_r/C_s)·(T_s/T_r)·(p_r/p_s): Beer-Lambert absorbance scales with
     * path, concentration and number density (p/T). An inverted measured band gives a path at or below zero,
     * which no tolerance accepts. The path is what a result's conditions correction takes as a CTS-derived path.
     *
     * @param referencePathM path of the reference CTS spectrum in m
     * @throws IllegalArgumentException if the reference band is not positive (a reference cannot be inverted)
     */
    public static double effectivePath(CtsBand measured, CtsBand reference, double referencePathM) {
        Require.notNull("measured", measured);
        Require.notNull("reference", reference);
        Require.positive("referencePathM", referencePathM);
        Require.positive("reference band absorbance", reference.absorbance());
        return referencePathM * (measured.absorbance() / reference.absorbance())
                * (reference.concentrationPpm() / measured.concentrationPpm())
                * (measured.temperatureK() / reference.temperatureK())
                * (reference.pressureKPa() / measured.pressureKPa());
    }

    public CheckOutcome evaluate(CtsBand measured, CtsBand reference, double referencePathM) {
        double path = effectivePath(measured, reference, referencePathM);
        Rule rule = new Rule("Effective path from the CTS band, L_s = L_r(A_s/A_r)(C_r/C_s)(T_s/T_r)(p_r/p_s), "
                + "within " + Format.number(tolerancePercent) + " % of the nominal " + Format.number(nominalPathM)
                + " m" + (measured.absorbance() > 0 ? "" : "; the measured band is inverted (area "
                        + Format.number(measured.absorbance()) + "): CTS gas in the background or a reversed ratio"),
                "formula: EPA Method 320 section 10.2 (not confirmed against the official text); tolerance: "
                        + "common practice, no source");
        return CheckOutcome.judge("CTS path length", path, "m",
                AcceptanceLimits.relative(nominalPathM, tolerancePercent), rule);
    }
}
