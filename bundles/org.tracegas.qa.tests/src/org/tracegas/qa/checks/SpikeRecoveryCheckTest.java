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
        assertTrue(low.rule().source().contains("section 8.6.2"), low.rule().source());
        // the report prints this source: it cites sections and never calls on recollection
        assertFalse(low.rule().source().contains("memory"), low.rule().source());
    }

    @Test
    void rejectsTracerAboveTheSpike() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> SpikeRecovery.of(GAS, new SpikedSample(12.0, 13.8, 5.0)));
        assertTrue(e.getMessage().contains("dilution factor"), e.getMessage());
    }

    @Test
    void dilutionAboveOneTenthFailsAndTheSpikeGasOriginIsStated() {
        // EPA Method 320 section 9.2 (not confirmed against the official text): spike flow at most 10 % of the
        // total flow, so DF = tracer(spiked) / tracer(direct) <= 0.10. SF6 0.9 of 10 ppm: DF 0.09; 1.2: DF 0.12
        SpikeGas direct = new SpikeGas(10.0, 100.0, "direct reading of the spike gas, mean of 3");
        SpikeRecoveryCheck check = new SpikeRecoveryCheck(SpikeRecoveryCheck.METHOD_320_LIMITS);
        CheckOutcome ok = check.dilution("HCl", direct, List.of(new SpikedSample(0.9, 13.0, 5.0)));
        assertTrue(ok.passed());
        assertEquals(0.09, ok.measured(), 1e-12);
        assertTrue(ok.rule().statement().contains("direct reading"), ok.rule().statement());
        CheckOutcome tooMuch = check.dilution("HCl", direct, List.of(new SpikedSample(0.9, 13.0, 5.0),
                new SpikedSample(1.2, 16.0, 5.0)));
        assertFalse(tooMuch.passed());
        assertEquals(0.12, tooMuch.measured(), 1e-12);
        assertTrue(check.evaluate("HCl", GAS, List.of(new SpikedSample(1.0, 13.8, 5.0))).rule().statement()
                .contains(SpikeGas.CYLINDER_LABEL));
    }
}
