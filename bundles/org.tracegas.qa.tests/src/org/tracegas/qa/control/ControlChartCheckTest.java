package org.tracegas.qa.control;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.tracegas.qa.checks.CheckOutcome;

class ControlChartCheckTest {

    private final ControlChartCheck check = new ControlChartCheck("Zero CO", "ppm", 5);

    @Test
    void limitsFromTheLatestEarlierReadingsWhenThereAreEnough() {
        // the latest five earlier readings 10.0, 10.2, 9.8, 10.1, 9.9: mean 10, s = 0.158114 (hand-computed);
        // the oldest reading 50 is outside the baseline
        ChartEvaluation e = check.evaluate(new double[] {50, 10.0, 10.2, 9.8, 10.1, 9.9},
                new double[] {10.05, 9.95, 10.1}).orElseThrow();
        assertTrue(e.baselineFromHistory());
        assertEquals(10.0, e.chart().centre(), 1e-12);
        assertEquals(0.158114, e.chart().sigma(), 1e-6);
        CheckOutcome o = e.outcome();
        assertTrue(o.passed());
        assertEquals(0, o.measured());
        assertEquals("Control chart: Zero CO", o.check());
        assertTrue(o.rule().statement().contains("latest 5 readings of earlier campaigns"), o.rule().statement());
    }

    @Test
    void aReadingBeyondTheActionLimitFailsAndIsNamed() {
        // 10.6 lies 3.8 sigma above the centre: WE1 (action limit 10.474)
        ChartEvaluation e = check.evaluate(new double[] {10.0, 10.2, 9.8, 10.1, 9.9},
                new double[] {10.0, 10.6, 9.9}).orElseThrow();
        assertFalse(e.outcome().passed());
        assertEquals(1, e.outcome().measured());
        assertTrue(e.outcome().rule().statement().contains("reading 2 WE1"), e.outcome().rule().statement());
    }

    @Test
    void aSmallSustainedShiftIsFoundByTheCusum() {
        // +1.1 sigma for 12 readings: each adds 0.6 sigma to S+, which passes h = 5 sigma at the 9th (5.4 sigma)
        // (tabular CUSUM arithmetic, worked by hand); no reading leaves the 2 sigma band, so WE1/WE2 stay quiet
        double s = 1.1 * 0.158114;
        double[] shifted = new double[12];
        java.util.Arrays.fill(shifted, 10 + s);
        ChartEvaluation e = check.evaluate(new double[] {10.0, 10.2, 9.8, 10.1, 9.9}, shifted).orElseThrow();
        assertEquals(8, e.cusum().firstSignal());
        assertTrue(e.signals().stream().noneMatch(g -> g.rule().startsWith("WE1") || g.rule().startsWith("WE2")));
        assertFalse(e.outcome().passed());
        assertTrue(e.signals().stream().anyMatch(g -> g.rule().startsWith("CUSUM")));
    }

    @Test
    void limitsFromTheFirstReadingsOfThisCampaignWithoutHistory() {
        double[] current = {1.0, 1.2, 0.8, 1.1, 0.9, 1.05, 0.95};
        ChartEvaluation e = check.evaluate(new double[] {3.0}, current).orElseThrow();
        assertFalse(e.baselineFromHistory());
        assertEquals(1.0, e.chart().centre(), 1e-12);
        assertEquals(5, e.baseline().length);
        assertTrue(e.outcome().passed());
        // the first five set the limits and are not judged (Montgomery's phase I / phase II, from memory)
        assertTrue(e.outcome().rule().statement().contains("none of the 2 readings judged signals (readings 6 to 7)"),
                e.outcome().rule().statement());
    }

    @Test
    void aReadingThatSetTheLimitsIsNeverJudgedAgainstThem() {
        // 8 readings set the limits (centre 10); readings 9..12 are judged. Counting the baseline's last four
        // high readings, readings 5..12 would be 8 in a row above the centre, a WE4 signal made of readings that
        // set the limits; judged alone, the four cannot make that run
        ControlChartCheck eight = new ControlChartCheck("Noise", "mAU", 8);
        double[] current = {9, 9, 9, 9, 11, 11, 11, 11, 11, 11, 11, 11};
        ChartEvaluation e = eight.evaluate(new double[0], current).orElseThrow();
        assertEquals(10.0, e.chart().centre(), 1e-12);
        assertTrue(e.signals().stream().noneMatch(g -> g.rule().startsWith("WE4")), e.signals().toString());
        assertTrue(e.outcome().rule().statement().contains("4 readings judged"), e.outcome().rule().statement());
        assertTrue(eight.evaluate(new double[0], java.util.Arrays.copyOf(current, 8)).isEmpty(),
                "nothing left to judge");
    }

    @Test
    void limitsFromAStatedSigmaJudgeEveryReadingAndNameTheirSource() {
        // centre 10, sigma 0.1 from a stated source: 10.35 lies 3.5 sigma out, WE1 at reading 2
        ChartEvaluation e = check.evaluate(10.0, 0.1, "QAL1 repeatability of the analyser", new double[] {10.05,
                10.35}).orElseThrow();
        assertEquals(0, e.baseline().length);
        assertFalse(e.outcome().passed());
        assertTrue(e.outcome().rule().statement().contains("reading 2 WE1"), e.outcome().rule().statement());
        assertTrue(e.outcome().rule().source().contains("QAL1 repeatability"), e.outcome().rule().source());
    }

    @Test
    void tooFewReadingsGiveNoChart() {
        assertTrue(check.evaluate(new double[] {1, 2}, new double[] {1, 2, 3, 4}).isEmpty());
        assertTrue(check.evaluate(new double[] {1, 2}, new double[] {1, 2, 3, 4, 5}).isEmpty());
        assertTrue(check.evaluate(new double[] {1, 2, 3, 4, 5}, new double[0]).isEmpty());
    }

    @Test
    void aBaselineWithoutSpreadIsRefusedByName() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> check.evaluate(new double[] {2, 2, 2, 2, 2}, new double[] {2}));
        assertTrue(e.getMessage().contains("Zero CO"), e.getMessage());
    }
}
