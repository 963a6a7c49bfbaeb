package org.tracegas.qa.control;

import java.util.List;

/**
 * Tabular CUSUM sums per sample and the samples where a sum exceeded the decision interval.
 */
public final class CusumResult {

    private final double[] upper;
    private final double[] lower;
    private final List<ControlSignal> signals;

    CusumResult(double[] upper, double[] lower, List<ControlSignal> signals) {
        this.upper = upper.clone();
        this.lower = lower.clone();
        this.signals = List.copyOf(signals);
    }

    /** S+ per sample (a copy). */
    public double[] upperSums() {
        return upper.clone();
    }

    /** S− per sample (a copy). */
    public double[] lowerSums() {
        return lower.clone();
    }

    public List<ControlSignal> signals() {
        return signals;
    }

    /** Index of the first signal, or −1 if the process stayed in control. */
    public int firstSignal() {
        return signals.isEmpty() ? -1 : signals.get(0).index();
    }
}
