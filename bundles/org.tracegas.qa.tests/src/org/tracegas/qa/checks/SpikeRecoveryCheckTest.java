package org.tracegas.qa.checks;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

class SpikeRecoveryCheckTest {

    private static final SpikeGas GAS = new SpikeGas(10.0, 100.0); // SF6 10 ppm, analyte 100 ppm

    @Test
    void recoveryOfOneSample() {
        // EPA Method 320 section 9.2.3 (not confirmed): DF = SF6(spiked)/SF6(direct);
        // expected = DF x spike + (1 - DF) x native. DF = 1/10; expected = 10 + 0.9 x 5 = 14.5 ppm;
        // recovery 13.8/14.5 = 95.17 % (hand-computed)
        SpikeRecovery r = SpikeRecovery.of(GAS, new SpikedSample(1.0, 13.8, 5.0));
        assertEquals(0.1, r.dilutionFactor(), 1e-15);
        assertEquals(14.5, r.expectedPpm(), 1e-12);
        assertEquals(95.172, r.recoveryPercent(), 1e-3);
    }

    @Test
    void meanRecoveryJudgedAt70To130Percent() {
        // EPA Method 320 section 8.6.2 and ASTM D6348: mean within 0.7-1.3 x expected (from memory, not confirmed)
        SpikeRecoveryCheck check = new SpikeRecoveryCheck(SpikeRecoveryCheck.METHOD_320_LIMITS);
        CheckOutcome ok = check.evaluate("HCl", GAS, List.of(new SpikedSample(1.0, 13.8, 5.0),
                new SpikedSample(1.0, 14.0, 5.0), new SpikedSample(1.0, 14.2, 5.0)));
        assertTrue(ok.passed());
        assertEquals(14.0 / 14.5 * 100, ok.measured(), 1e-9);
        CheckOutcome low = check.evaluate("HCl", GAS, List.of(new SpikedSample(1.0, 10.0, 5.0)));
        assertFalse(low.passed()); // 68.97 %
        assertTrue(low.rule().source().contains("D6348"));
    }

    @Test
    void rejectsTracerAboveTheSpike() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> SpikeRecovery.of(GAS, new SpikedSample(12.0, 13.8, 5.0)));
        assertTrue(e.getMessage().contains("dilution factor"), e.getMessage());
    }
}
