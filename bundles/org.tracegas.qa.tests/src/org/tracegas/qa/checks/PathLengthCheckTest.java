package org.tracegas.qa.checks;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class PathLengthCheckTest {

    private static final CtsBand REFERENCE = new CtsBand(0.500, 100.0, 298.15, 101.325);

    @Test
    void effectivePathFollowsBeerLambert() {
        // L_s = L_r (A_s/A_r)(C_r/C_s)(T_s/T_r)(p_r/p_s), EPA Method 320 section 10.2 (not confirmed):
        // 10 m x (0.53/0.5) x (100/102) x (308.15/298.15) x (101.325/99.0) = 10.9930 m (hand-computed)
        CtsBand measured = new CtsBand(0.530, 102.0, 308.15, 99.0);
        assertEquals(10.0 * 1.06 * (100 / 102.0) * (308.15 / 298.15) * (101.325 / 99.0),
                PathLengthCheck.effectivePath(measured, REFERENCE, 10.0), 1e-12);
        assertEquals(10.9930, PathLengthCheck.effectivePath(measured, REFERENCE, 10.0), 5e-4);
    }

    @Test
    void judgedAgainstNominal() {
        PathLengthCheck check = new PathLengthCheck(10.0, PathLengthCheck.COMMON_PRACTICE_TOLERANCE_PERCENT);
        CheckOutcome ok = check.evaluate(new CtsBand(0.520, 100, 298.15, 101.325), REFERENCE, 10.0);
        assertTrue(ok.passed());
        assertEquals(10.4, ok.measured(), 1e-12);
        CheckOutcome bad = check.evaluate(new CtsBand(0.530, 100, 298.15, 101.325), REFERENCE, 10.0);
        assertFalse(bad.passed()); // 10.6 m is 6 % above the nominal 10 m
        assertTrue(bad.rule().source().contains("common practice"));
        assertEquals(9.5, bad.limits().lower(), 1e-12);
    }

    @Test
    void anInvertedBandFailsInsteadOfPassingAsItsMirrorImage() {
        // an inverted CTS band (CTS gas in the background, common practice, no source) has the same magnitude as
        // a good one: with |A| it would pass at 10.4 m; with its sign the path is -10.4 m and fails
        PathLengthCheck check = new PathLengthCheck(10.0, PathLengthCheck.COMMON_PRACTICE_TOLERANCE_PERCENT);
        CheckOutcome inverted = check.evaluate(new CtsBand(-0.520, 100, 298.15, 101.325), REFERENCE, 10.0);
        assertFalse(inverted.passed());
        assertEquals(-10.4, inverted.measured(), 1e-12);
        assertTrue(inverted.rule().statement().contains("inverted"), inverted.rule().statement());
        assertThrows(IllegalArgumentException.class, () -> PathLengthCheck.effectivePath(REFERENCE,
                new CtsBand(-0.5, 100, 298.15, 101.325), 10.0));
    }

    @Test
    void theCtsDerivedPathFeedsTheConditionsCorrection() {
        // a mirror drift that lengthens the path by 4 % reads 4 % high; the CTS-derived path takes it back out
        // (EPA FTIR Protocol section 11.2 with L_r/L_s, not confirmed against the official text)
        double path = PathLengthCheck.effectivePath(new CtsBand(0.520, 100, 298.15, 101.325), REFERENCE, 10.0);
        org.tracegas.qa.basis.CellConditions cell = new org.tracegas.qa.basis.CellConditions(
                new org.tracegas.qa.basis.ConditionValue(298.15, org.tracegas.qa.basis.ConditionOrigin.FILE_LABEL),
                new org.tracegas.qa.basis.ConditionValue(101.325, org.tracegas.qa.basis.ConditionOrigin.FILE_LABEL),
                path, org.tracegas.qa.basis.PathOrigin.CTS_DERIVED);
        assertEquals(50.0, new org.tracegas.qa.basis.ConditionsCorrection(298.15, 101.325, 10.0).correct(52.0, cell)
                .corrected(), 1e-9);
    }
}
