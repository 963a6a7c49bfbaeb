package org.tracegas.qa.campaign;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import org.tracegas.qa.checks.CheckOutcome;
import org.tracegas.qa.control.ChartEvaluation;
import org.tracegas.qa.control.ControlChartCheck;
import org.tracegas.report.Level;
import org.tracegas.report.Plot;
import org.tracegas.report.Series;

/**
 * Control charts of the campaign's repeated QA readings: every check named here (for example "Zero CO",
 * "Noise level", "CTS path length") is charted with the readings of this campaign against those of earlier
 * campaigns of the same method, when there are enough of them for the limits. A zero reading may instead be
 * charted with a stated σ, for example the analyser's repeatability at zero from its performance figures
 * (EN 14181:2014 QAL3 sets the chart parameters from S taken from QAL1 data, per its table of contents): its centre
 * is then the zero gas's content, 0, every reading of the campaign is judged, and the rule names the source.
 */
public final class QaControlCharts {

    private final List<String> readings;
    private final int baselineSize;
    private final Map<String, Double> statedSigma;
    private final String sigmaSource;

    /**
     * @param readings     names of the repeated checks to chart
     * @param baselineSize readings the limits are set from (see {@link ControlChartCheck})
     */
    public QaControlCharts(List<String> readings, int baselineSize) {
        this(readings, baselineSize, Map.of(), "");
    }

    /**
     * @param readings     names of the repeated checks to chart
     * @param baselineSize readings the limits of the readings without a stated σ are set from
     * @param statedSigma  σ per zero reading ("Zero " and an analyte) among the readings, ppm, positive
     * @param sigmaSource  where the stated σ come from; text when any σ is stated
     */
    public QaControlCharts(List<String> readings, int baselineSize, Map<String, Double> statedSigma,
            String sigmaSource) {
        this.readings = List.copyOf(readings);
        if (baselineSize < 2) {
            throw new IllegalArgumentException("baselineSize must be at least 2, was " + baselineSize);
        }
        this.baselineSize = baselineSize;
        this.statedSigma = Map.copyOf(statedSigma);
        this.sigmaSource = sigmaSource.strip();
        for (Map.Entry<String, Double> e : this.statedSigma.entrySet()) {
            if (!this.readings.contains(e.getKey()) || !e.getKey().startsWith("Zero ")) {
                throw new IllegalArgumentException("statedSigma: '" + e.getKey() + "' is not a zero reading among "
                        + this.readings);
            }
            if (!(e.getValue() > 0) || !Double.isFinite(e.getValue())) {
                throw new IllegalArgumentException("statedSigma of " + e.getKey() + " must be positive, was "
                        + e.getValue());
            }
        }
        if (!this.statedSigma.isEmpty() && this.sigmaSource.isEmpty()) {
            throw new IllegalArgumentException("sigmaSource: a stated sigma needs its source");
        }
    }

    /** Names of the checked readings charted, as the repeated checks are named. */
    public List<String> readings() {
        return readings;
    }

    public int baselineSize() {
        return baselineSize;
    }

    /** The stated σ of zero readings, ppm, by reading; those readings are charted without a baseline. */
    public Map<String, Double> statedSigma() {
        return statedSigma;
    }

    /** Where the stated σ come from; empty when none is stated. */
    public String sigmaSource() {
        return sigmaSource;
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
            ControlChartCheck check = new ControlChartCheck(reading, unit, baselineSize);
            Double sigma = statedSigma.get(reading);
            if (sigma == null) {
                check.evaluate(values(history, reading), values(current, reading)).ifPresent(charts::add);
            } else if (!now.isEmpty() && !unit.equals("ppm")) {
                throw new IllegalArgumentException("the stated sigma of " + reading + " is in ppm, the reading in "
                        + unit);
            } else {
                // the zero gas contains none of the analyte: 0 is the reference of a zero reading
                check.evaluate(0, sigma, "centre 0 ppm, the zero gas; sigma stated: " + sigmaSource,
                        values(current, reading)).ifPresent(charts::add);
            }
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
        String limits = e.baselineFromHistory() ? "earlier campaigns"
                : e.baseline().length == 0 ? "a stated sigma" : "its first readings";
        return new Plot(e.reading() + ", readings of this campaign (limits from " + limits + ")", "Reading", e.unit().isEmpty() ? "value"
                        : e.unit(), series, false, List.of(new Level("centre", e.chart().centre()),
                                new Level("+3 sigma", e.chart().upperActionLimit()),
                                new Level("-3 sigma", e.chart().lowerActionLimit()),
                                new Level("+2 sigma", e.chart().upperWarningLimit()),
                                new Level("-2 sigma", e.chart().lowerWarningLimit())));
    }
}
