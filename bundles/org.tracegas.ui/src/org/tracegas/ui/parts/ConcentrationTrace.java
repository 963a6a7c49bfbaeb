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

    /** Times of the flagged values only. */
    public double[] flaggedHours() {
        return flagged.stream().filter(i -> i < hours.length).mapToDouble(i -> hours[i]).toArray();
    }

    /** The flagged values only, in time order. */
    public double[] flaggedValues() {
        return flagged.stream().filter(i -> i < values.length).mapToDouble(i -> values[i]).toArray();
    }
}
