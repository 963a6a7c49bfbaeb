package org.tracegas.qa.control;

import java.util.List;

import org.tracegas.qa.checks.CheckOutcome;

/**
 * A repeated reading evaluated on its control chart: the readings the limits were set from, this campaign's
 * readings, the chart's centre and σ, the signals, and the check outcome that decides.
 */
public final class ChartEvaluation {

    private final String reading;
    private final String unit;
    private final double[] baseline;
    private final boolean baselineFromHistory;
    private final double[] values;
    private final ShewhartChart chart;
    private final List<ControlSignal> signals;
    private final CusumResult cusum;
    private final CheckOutcome outcome;

    ChartEvaluation(String reading, String unit, double[] baseline, boolean baselineFromHistory, double[] values,
            ShewhartChart chart, List<ControlSignal> signals, CusumResult cusum, CheckOutcome outcome) {
        this.reading = reading;
        this.unit = unit;
        this.baseline = baseline.clone();
        this.baselineFromHistory = baselineFromHistory;
        this.values = values.clone();
        this.chart = chart;
        this.signals = List.copyOf(signals);
        this.cusum = cusum;
        this.outcome = outcome;
    }

    /** Name of the charted reading, for example "Noise level". */
    public String reading() {
        return reading;
    }

    public String unit() {
        return unit;
    }

    /** The readings the centre line and σ were estimated from (a copy); empty for a stated centre and σ. */
    public double[] baseline() {
        return baseline.clone();
    }

    /** Whether the baseline holds readings of earlier campaigns, not the first readings of this one. */
    public boolean baselineFromHistory() {
        return baselineFromHistory;
    }

    /** This campaign's readings in order (a copy). */
    public double[] values() {
        return values.clone();
    }

    public ShewhartChart chart() {
        return chart;
    }

    /** Shewhart and CUSUM signals, indices into {@link #values()}, ordered by index. */
    public List<ControlSignal> signals() {
        return signals;
    }

    /** The CUSUM of the readings judged (those after a baseline taken from this campaign, else all). */
    public CusumResult cusum() {
        return cusum;
    }

    /** Passes when no reading signals; measured is the number of signals. */
    public CheckOutcome outcome() {
        return outcome;
    }
}
