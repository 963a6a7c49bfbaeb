package org.tracegas.ui.parts;

import java.util.BitSet;

/**
 * One compound's concentrations over time, for the time-series view.
 *
 * @param compound compound name
 * @param unit     concentration unit, e.g. "ppm"
 * @param hours    time of each value in hours from the start of the shown period, ascending
 * @param values   concentration at each time
 * @param flagged  indices of values that carry a quality flag
 */
public record ConcentrationTrace(String compound, String unit, double[] hours, double[] values, BitSet flagged) {

    /** @throws IllegalArgumentException naming the compound whose arrays differ in length */
    public ConcentrationTrace {
        if (hours.length != values.length) {
            throw new IllegalArgumentException("trace " + compound + ": " + values.length + " values for "
                    + hours.length + " times");
        }
        flagged = (BitSet) flagged.clone();
    }

    /** The values at flagged times and NaN elsewhere (NaN points are not drawn). */
    public double[] flaggedValues() {
        double[] f = new double[values.length];
        java.util.Arrays.fill(f, Double.NaN);
        for (int i = flagged.nextSetBit(0); i >= 0 && i < f.length; i = flagged.nextSetBit(i + 1)) {
            f[i] = values[i];
        }
        return f;
    }
}
