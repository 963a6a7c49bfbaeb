package org.tracegas.qa.checks;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
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
}
