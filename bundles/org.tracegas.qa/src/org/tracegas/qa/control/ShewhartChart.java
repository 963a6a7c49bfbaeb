package org.tracegas.qa.control;

import java.util.ArrayList;
import java.util.List;

import org.tracegas.qa.internal.Require;
import org.tracegas.qa.internal.Stats;

/**
 * Shewhart chart for individual values with centre line μ, warning limits μ ± 2σ and action limits
 * μ ± 3σ. Evaluates Western Electric rule 1 (one point beyond 3σ), rule 2 (two of three successive
 * points beyond 2σ on the same side) and rule 4 (eight successive points on one side of the centre line).
 * EN 14181:2014 names Shewhart charts among the QAL3 methods, with σ taken from the QAL1 data.
 */
public final class ShewhartChart {

    private final double centre;
    private final double sigma;

    public ShewhartChart(double centre, double sigma) {
        this.centre = Require.finite("centre", centre);
        this.sigma = Require.positive("sigma", sigma);
    }

    /** Centre line and σ estimated from baseline data (mean and sample standard deviation). */
    public static ShewhartChart fromBaseline(double[] baseline) {
        return new ShewhartChart(Stats.mean(baseline), Stats.sampleStandardDeviation(baseline));
    }

    public double centre() {
        return centre;
    }

    public double sigma() {
        return sigma;
    }

    public double upperActionLimit() {
        return centre + 3 * sigma;
    }

    public double lowerActionLimit() {
        return centre - 3 * sigma;
    }

    public double upperWarningLimit() {
        return centre + 2 * sigma;
    }

    public double lowerWarningLimit() {
        return centre - 2 * sigma;
    }

    /** All rule violations, ordered by sample index; a sample may be flagged by several rules. */
    public List<ControlSignal> evaluate(double[] values) {
        Require.notNull("values", values);
        List<ControlSignal> signals = new ArrayList<>();
        for (int i = 0; i < values.length; i++) {
            double z = (Require.finite("value " + i, values[i]) - centre) / sigma;
            if (Math.abs(z) > 3) {
                signals.add(new ControlSignal(i, "WE1: beyond the 3 sigma action limit"));
            }
            if (i >= 2 && beyondTwoSigmaSameSide(values, i)) {
                signals.add(new ControlSignal(i, "WE2: 2 of 3 successive points beyond 2 sigma on one side"));
            }
            if (i >= 7 && sameSide(values, i - 7, i)) {
                signals.add(new ControlSignal(i, "WE4: 8 successive points on one side of the centre line"));
            }
        }
        return List.copyOf(signals);
    }

    private boolean beyondTwoSigmaSameSide(double[] v, int end) {
        int above = 0;
        int below = 0;
        for (int j = end - 2; j <= end; j++) {
            double z = (v[j] - centre) / sigma;
            above += z > 2 ? 1 : 0;
            below += z < -2 ? 1 : 0;
        }
        double zEnd = (v[end] - centre) / sigma;
        // the point that completes the pattern is the one flagged
        return (above >= 2 && zEnd > 2) || (below >= 2 && zEnd < -2);
    }

    private boolean sameSide(double[] v, int from, int to) {
        boolean allAbove = true;
        boolean allBelow = true;
        for (int j = from; j <= to; j++) {
            allAbove &= v[j] > centre;
            allBelow &= v[j] < centre;
        }
        return allAbove || allBelow;
    }
}
