package org.tracegas.qa.checks;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class MethodDetectionLimitTest {

    /**
     * The one-sided 99 % t values of the MDL procedure's table (40 CFR Part 136 Appendix B, as reproduced in Wis.
     * Adm. Code NR 252.0365, which also gives t(12) = 2.681 for a pooled S of 14 aliquots), to its 3 decimals.
     */
    @ParameterizedTest
    @CsvSource({ "6, 3.143", "7, 2.998", "8, 2.896", "9, 2.821", "10, 2.764", "12, 2.681", "15, 2.602",
            "20, 2.528", "25, 2.485", "30, 2.457", "60, 2.390" })
    void tValuesOfThePublishedTable(int degreesOfFreedom, double published) {
        assertEquals(published, MethodDetectionLimit.oneSidedT99(degreesOfFreedom), 0.0005 + 1e-9);
    }

    @Test
    void tOfTwelveReadings() {
        // t(11, 0.99) = 2.718: Student's t table (NIST/SEMATECH e-Handbook 1.3.6.7.2), from memory
        assertEquals(2.718, MethodDetectionLimit.oneSidedT99(11), 0.0005);
    }

    @Test
    void mdlOfSevenZeroReadings() {
        // readings 0.1, -0.1, 0.2, -0.2, 0, 0.3, -0.3 ppm: mean 0, sum of squares 0.28, S = sqrt(0.28 / 6)
        // = 0.216025 ppm (hand-computed); MDL = 3.143 x S = 0.678966 ppm with the table's t(6)
        double[] zero = { 0.1, -0.1, 0.2, -0.2, 0, 0.3, -0.3 };
        double[] u = { 0.05, 0.05, 0.05, 0.05, 0.05, 0.05, 0.05 };
        MethodDetectionLimit mdl = MethodDetectionLimit.fromZeroReadings("HCl", zero, u);
        assertEquals(0.216025, mdl.standardDeviation(), 1e-6);
        assertEquals(3.143 * 0.216025, mdl.ppm(), 0.0005 * 0.216025 + 1e-6);
        assertEquals(7, mdl.readings());
        // MAU = 3 x RMS of the fit's uncertainties = 0.15 ppm
        assertEquals(0.15, mdl.minimumAnalyteUncertainty(), 1e-12);
        assertEquals(mdl.ppm(), mdl.detectionLimit().ppm(), 0);
        assertTrue(mdl.detectionLimit().check(0.7).passed());
        assertFalse(mdl.detectionLimit().check(0.6).passed());
    }

    @Test
    void outcomesStateTheirNumbersAndReadBack() {
        MethodDetectionLimit mdl = MethodDetectionLimit.fromZeroReadings("NO",
                new double[] { 0.01, -0.02, 0.03, 0.0, -0.01, 0.02, -0.03, 0.01 }, new double[8]);
        List<CheckOutcome> outcomes = mdl.outcomes();
        assertEquals("Method detection limit NO", outcomes.get(0).check());
        assertTrue(outcomes.get(0).passed(), "8 readings are enough");
        String rule = outcomes.get(0).rule().statement();
        assertTrue(rule.contains("n = 8") && rule.contains("2.998 x"), rule);
        assertTrue(outcomes.get(0).rule().source().contains("40 CFR Part 136 Appendix B"));
        assertTrue(outcomes.get(1).rule().source().contains("Method 320 section 8.1.6"));
        List<CheckOutcome> stored = new ArrayList<>(outcomes);
        stored.add(0, new CheckOutcome("Zero NO", true, 0.01, "ppm", AcceptanceLimits.atMost(1),
                new Rule("zero", "test")));
        List<MethodDetectionLimit> back = MethodDetectionLimit.fromOutcomes(stored);
        assertEquals(1, back.size());
        assertEquals(mdl.ppm(), back.get(0).ppm(), 1e-15);
        assertEquals(mdl.readings(), back.get(0).readings());
        assertEquals(mdl.minimumAnalyteUncertainty(), back.get(0).minimumAnalyteUncertainty(), 0);
    }

    @Test
    void fewerThanSevenReadingsFail() {
        MethodDetectionLimit mdl = MethodDetectionLimit.fromZeroReadings("CO", new double[] { 0.1, -0.1, 0.05 },
                new double[3]);
        assertFalse(mdl.outcomes().get(0).passed());
    }

    @Test
    void badInputIsNamed() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> MethodDetectionLimit.fromZeroReadings("CO", new double[] { 0.1, 0.2 }, new double[3]));
        assertTrue(e.getMessage().contains("standardUncertaintiesPpm"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> MethodDetectionLimit.oneSidedT99(0));
        assertThrows(IllegalArgumentException.class, () -> MethodDetectionLimit.fromOutcomes(List.of(
                new CheckOutcome("Method detection limit CO", true, 1, "ppm", AcceptanceLimits.atMost(2),
                        new Rule("no numbers", "test")))));
    }
}
