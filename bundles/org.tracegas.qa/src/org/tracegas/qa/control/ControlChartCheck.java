package org.tracegas.qa.control;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;

import org.tracegas.qa.checks.AcceptanceLimits;
import org.tracegas.qa.checks.CheckOutcome;
import org.tracegas.qa.checks.Rule;
import org.tracegas.qa.internal.Format;
import org.tracegas.qa.internal.Require;
import org.tracegas.qa.internal.Stats;

/**
 * Judges a campaign's repeated readings of one QA check (zero, span, noise level ...) on a Shewhart chart
 * with Western Electric rules 1, 2 and 4 and a tabular CUSUM. Limit rule: centre line and σ are the mean
 * and sample standard deviation of the latest n readings of earlier campaigns when there are n of them,
 * otherwise of the first n readings of this campaign, which then set the limits and are not judged (a reading
 * cannot be tested against limits it helped set); with fewer readings there is no chart. Limits may instead come
 * from a stated centre and σ (for example a QAL1 repeatability), with its source.
 */
public final class ControlChartCheck {

    /**
     * CUSUM reference value in σ units: k = 1/2 with h = 4 or 5 gives good average run lengths against a shift of
     * 1σ (Montgomery and Runger, Applied Statistics and Probability for Engineers, section 16-10).
     */
    public static final double CUSUM_K = 0.5;
    /** CUSUM decision interval in σ units (Montgomery and Runger, section 16-10: h = 4 or 5). */
    public static final double CUSUM_H = 5.0;
    /** Signals listed in the rule statement; more are counted. */
    private static final int LISTED_SIGNALS = 8;
    private static final String SOURCE = "Shewhart chart of individual readings with Western Electric run rules 1 "
            + "(a point beyond 3 sigma), 2 (2 of 3 successive points beyond 2 sigma) and 4 (8 successive points on "
            + "one side), as the StatSoft statistics glossary lists them ('Western Electric Run Rules', after AT&T "
            + "1959); tabular CUSUM with k = 0.5 sigma, h = 5 sigma (Montgomery and Runger, Applied Statistics and "
            + "Probability for Engineers, section 16-10)";

    private final String reading;
    private final String unit;
    private final int baselineSize;

    /**
     * @param reading      name of the charted reading, as the repeated check is named
     * @param unit         its unit
     * @param baselineSize n, the readings the limits are set from, at least 2
     */
    public ControlChartCheck(String reading, String unit, int baselineSize) {
        this.reading = Require.text("reading", reading);
        this.unit = Require.notNull("unit", unit);
        if (baselineSize < 2) {
            throw new IllegalArgumentException("baselineSize must be at least 2, was " + baselineSize);
        }
        this.baselineSize = baselineSize;
    }

    /** Name of the check outcome of this chart. */
    public String checkName() {
        return "Control chart: " + reading;
    }

    /**
     * @param history readings of earlier campaigns, oldest first
     * @param current this campaign's readings, in order
     * @return empty when neither holds enough readings for the limits, or no reading of this campaign is left
     *         to judge
     * @throws IllegalArgumentException if the baseline readings are all equal (no σ to chart with)
     */
    public Optional<ChartEvaluation> evaluate(double[] history, double[] current) {
        Require.notNull("history", history);
        Require.notNull("current", current);
        boolean fromHistory = history.length >= baselineSize;
        if (current.length == 0 || (!fromHistory && current.length <= baselineSize)) {
            return Optional.empty();
        }
        double[] baseline = fromHistory ? Arrays.copyOfRange(history, history.length - baselineSize, history.length)
                : Arrays.copyOf(current, baselineSize);
        double sigma = Stats.sampleStandardDeviation(baseline);
        if (sigma == 0) {
            throw new IllegalArgumentException("the " + baselineSize + " baseline readings of " + reading
                    + " are all equal; a control chart needs their spread");
        }
        String basis = fromHistory ? "the latest " + baselineSize + " readings of earlier campaigns"
                : "the first " + baselineSize + " readings of this campaign, which are not judged";
        return Optional.of(judge(baseline, fromHistory, current, fromHistory ? 0 : baselineSize,
                new ShewhartChart(Stats.mean(baseline), sigma), basis, SOURCE));
    }

    /**
     * Judges every reading of this campaign against limits from a stated centre and σ.
     *
     * @param sigmaSource where the centre and σ come from, for example the QAL1 report of the analyser
     * @return empty when this campaign has no reading
     */
    public Optional<ChartEvaluation> evaluate(double centre, double sigma, String sigmaSource, double[] current) {
        Require.notNull("current", current);
        Require.text("sigmaSource", sigmaSource);
        if (current.length == 0) {
            return Optional.empty();
        }
        return Optional.of(judge(new double[0], false, current, 0, new ShewhartChart(centre, sigma),
                "the stated values (" + sigmaSource + ")", SOURCE + "; limits: " + sigmaSource));
    }

    private ChartEvaluation judge(double[] baseline, boolean fromHistory, double[] current, int firstJudged,
            ShewhartChart chart, String basis, String source) {
        double[] judged = Arrays.copyOfRange(current, firstJudged, current.length);
        CusumResult cusum = new CusumChart(chart.centre(), chart.sigma(), CUSUM_K, CUSUM_H).evaluate(judged);
        List<ControlSignal> signals = new ArrayList<>();
        for (ControlSignal g : chart.evaluate(judged)) {
            signals.add(new ControlSignal(g.index() + firstJudged, g.rule()));
        }
        for (ControlSignal g : cusum.signals()) {
            signals.add(new ControlSignal(g.index() + firstJudged, g.rule()));
        }
        signals.sort(Comparator.comparingInt(ControlSignal::index));
        StringBuilder statement = new StringBuilder("Passes when none of the " + judged.length
                + " readings judged signals" + (firstJudged > 0 ? " (readings " + (firstJudged + 1) + " to "
                        + current.length + ")" : "") + ". Centre " + Format.number(chart.centre()) + " " + unit
                + ", sigma " + Format.number(chart.sigma()) + " " + unit + " from " + basis + "; action limits "
                + Format.number(chart.lowerActionLimit()) + " .. " + Format.number(chart.upperActionLimit())
                + ", warning limits " + Format.number(chart.lowerWarningLimit()) + " .. "
                + Format.number(chart.upperWarningLimit()) + "; CUSUM k = 0.5 sigma, h = 5 sigma.");
        for (int i = 0; i < Math.min(LISTED_SIGNALS, signals.size()); i++) {
            statement.append(i == 0 ? " Signals: " : "; ").append("reading ").append(signals.get(i).index() + 1)
                    .append(' ').append(signals.get(i).rule());
        }
        if (signals.size() > LISTED_SIGNALS) {
            statement.append("; and ").append(signals.size() - LISTED_SIGNALS).append(" more");
        }
        CheckOutcome outcome = CheckOutcome.judge(checkName(), signals.size(), "signals", AcceptanceLimits.atMost(0),
                new Rule(statement.toString(), source));
        return new ChartEvaluation(reading, unit, baseline, fromHistory, current, chart, signals, cusum, outcome);
    }
}
