package org.tracegas.qa.control;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

class ShewhartChartTest {

    // baseline 10.0, 10.2, 9.8, 10.1, 9.9: mean 10, s = sqrt(0.10/4) = 0.158114 (hand-computed)
    private final ShewhartChart chart = ShewhartChart.fromBaseline(new double[] {10.0, 10.2, 9.8, 10.1, 9.9});

    @Test
    void limitsFromBaseline() {
        // mean ± 3 s action limits, ± 2 s warning limits (general Shewhart rule; IUPAC Gold Book, not confirmed)
        assertEquals(10.0, chart.centre(), 1e-12);
        assertEquals(0.158114, chart.sigma(), 1e-6);
        assertEquals(10.474342, chart.upperActionLimit(), 1e-6);
        assertEquals(9.525658, chart.lowerActionLimit(), 1e-6);
        assertEquals(10.316228, chart.upperWarningLimit(), 1e-6);
    }

    @Test
    void westernElectricRuleOne() {
        List<ControlSignal> s = chart.evaluate(new double[] {10.0, 10.1, 10.5, 9.9, 9.5});
        assertEquals(2, s.size());
        assertEquals(2, s.get(0).index());
        assertEquals(4, s.get(1).index());
        assertTrue(s.get(0).rule().startsWith("WE1"));
    }

    @Test
    void westernElectricRuleTwo() {
        // 10.35 and 10.40 lie between 2 and 3 sigma above the centre: the second completes the pattern
        List<ControlSignal> s = chart.evaluate(new double[] {10.0, 10.35, 9.9, 10.40});
        assertEquals(List.of(new ControlSignal(3, "WE2: 2 of 3 successive points beyond 2 sigma on one side")), s);
    }

    @Test
    void westernElectricRuleFour() {
        double[] v = {10.05, 10.05, 10.05, 10.05, 10.05, 10.05, 10.05, 10.05, 9.95};
        List<ControlSignal> s = chart.evaluate(v);
        assertEquals(1, s.size());
        assertEquals(7, s.get(0).index());
    }

    @Test
    void inControlDataGiveNoSignals() {
        assertTrue(chart.evaluate(new double[] {10.0, 10.2, 9.8, 10.1, 9.9, 10.0, 10.1}).isEmpty());
    }
}
