package org.tracegas.campaign;

import java.util.ArrayList;
import java.util.List;

import org.tracegas.qa.checks.CheckOutcome;
import org.tracegas.qa.control.ChartEvaluation;
import org.tracegas.qa.control.ControlChartCheck;
import org.tracegas.report.Level;
import org.tracegas.report.Plot;
import org.tracegas.report.Series;

/**
 * Control charts of the campaign's repeated QA readings: every check named here (for example "Zero CO",
 * "Noise level", "CTS path length") is charted with the readings of this campaign against those of earlier
 * campaigns of the same method, when there are enough of them for the limits.
 */
public final class QaControlCharts {

    private final List<String> readings;
    private final int baselineSize;

    /**
     * @param readings     names of the repeated checks to chart
     * @param baselineSize readings the limits are set from (see {@link ControlChartCheck})
     */
    public QaControlCharts(List<String> readings, int baselineSize) {
        this.readings = List.copyOf(readings);
        if (baselineSize < 2) {
            throw new IllegalArgumentException("baselineSize must be at least 2, was " + baselineSize);
        }
        this.baselineSize = baselineSize;
    }

    /** Names of the checked readings charted, as the repeated checks are named. */
    public List<String> readings() {
        return readings;
    }

    public int baselineSize() {
        return baselineSize;
    }

    /** Whether an outcome is the decision of one of these charts, not a reading to chart. */
    public boolean isChartOutcome(CheckOutcome outcome) {
        return readings.stream().anyMatch(r -> new ControlChartCheck(r, "", baselineSize).checkName()
                .equals(outcome.check()));
    }

    /**
     * @param history outcomes stored by earlier campaigns, oldest first
     * @param current this campaign's outcomes, in order
     * @return one evaluation per reading that has enough readings for its limits
     */
    public List<ChartEvaluation> evaluate(List<CheckOutcome> history, List<CheckOutcome> current) {
        List<ChartEvaluation> charts = new ArrayList<>();
        for (String reading : readings) {
            List<CheckOutcome> now = current.stream().filter(o -> o.check().equals(reading)).toList();
            String unit = now.isEmpty() ? "" : now.get(0).unit();
            new ControlChartCheck(reading, unit, baselineSize).evaluate(values(history, reading), values(current,
                    reading)).ifPresent(charts::add);
        }
        return List.copyOf(charts);
    }

    private static double[] values(List<CheckOutcome> outcomes, String reading) {
        return outcomes.stream().filter(o -> o.check().equals(reading)).mapToDouble(CheckOutcome::measured)
                .toArray();
    }

    /** The chart for the report: readings, signalling readings marked, centre line and 2σ and 3σ limits. */
    public static Plot plot(ChartEvaluation e) {
        double[] y = e.values();
        double[] x = new double[y.length];
        for (int i = 0; i < x.length; i++) {
            x[i] = i + 1;
        }
        double[] sx = e.signals().stream().mapToDouble(s -> s.index() + 1).distinct().toArray();
        double[] sy = new double[sx.length];
        for (int i = 0; i < sx.length; i++) {
            sy[i] = y[(int) sx[i] - 1];
        }
        List<Series> series = new ArrayList<>();
        // a single reading is drawn as a marker: a line needs two
        series.add(y.length >= 2 ? new Series("reading", x, y) : Series.points("reading", x, y));
        if (sx.length > 0) {
            series.add(Series.points("signal", sx, sy));
        }
        return new Plot(e.reading() + ", readings of this campaign (limits from " + (e.baselineFromHistory()
                ? "earlier campaigns" : "its first readings") + ")", "Reading", e.unit().isEmpty() ? "value"
                        : e.unit(), series, false, List.of(new Level("centre", e.chart().centre()),
                                new Level("+3 sigma", e.chart().upperActionLimit()),
                                new Level("-3 sigma", e.chart().lowerActionLimit()),
                                new Level("+2 sigma", e.chart().upperWarningLimit()),
                                new Level("-2 sigma", e.chart().lowerWarningLimit())));
    }
}
