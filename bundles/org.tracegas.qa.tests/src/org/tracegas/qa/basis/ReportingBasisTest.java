package org.tracegas.qa.basis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Instant;
import java.util.List;

import org.junit.jupiter.api.Test;

class ReportingBasisTest {

    private static final Instant T0 = Instant.parse("2026-03-02T10:00:00Z");

    @Test
    void wetPpmToDryMassAtReferenceOxygen() {
        ReportingBasis basis = new ReportingBasis(StandardConditions.NORMAL, new OxygenCorrection(11, 20));
        // 100 ppm CO = 124.97 mg/m³ (common practice, no source); dry at 20 % H2O: / 0.8; to 11 % O2 from 14 %:
        // x 10/7 (EU IED Annex VI Part 7, from memory) -> 223.16 mg/m³ (hand-computed)
        double v = basis.convert(new GasReading(T0, 100, 0.20, 14), 28.010).orElseThrow().value();
        assertEquals(124.97 / 0.8 * 10 / 7, v, 0.01);
    }

    @Test
    void readingsAboveTheOxygenGuardAreLeftOut() {
        ReportingBasis basis = new ReportingBasis(StandardConditions.NORMAL, new OxygenCorrection(11, 20));
        List<TimedValue> out = basis.convertAll(List.of(new GasReading(T0, 10, 0.1, 12),
                new GasReading(T0.plusSeconds(60), 10, 0.1, 20.6)), 28.010);
        assertEquals(1, out.size());
        assertEquals(T0, out.get(0).time());
    }

    @Test
    void describesTheBasis() {
        String d = new ReportingBasis(StandardConditions.EU_EMISSIONS, new OxygenCorrection(10, 20)).describe();
        assertTrue(d.contains("dry") && d.contains("273.15 K, 101.3 kPa") && d.contains("10 % O2"), d);
    }
}
