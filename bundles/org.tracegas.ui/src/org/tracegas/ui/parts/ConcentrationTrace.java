package org.tracegas.ui.parts;

import java.util.BitSet;
import java.util.List;

/**
 * One compound's concentrations over time, for the time-series view.
 *
 * @param compound compound name
 * @param unit     concentration unit, e.g. "ppm"
 * @param hours    time of each value in hours from the start of the shown period, ascending
 * @param values   concentration at each time
 * @param flagged  indices of values that carry a quality flag
 * @param measurementIds the stored measurement of each value, or empty when the values are not stored
 */
public record ConcentrationTrace(String compound, String unit, double[] hours, double[] values, BitSet flagged,
        List<String> measurementIds) {

    /**
     * @throws IllegalArgumentException naming the compound whose arrays differ in length, or whose measurement
     *                                  ids (when known) do not match its values
     */
    public ConcentrationTrace {
        if (hours.length != values.length) {
            throw new IllegalArgumentException("trace " + compound + ": " + values.length + " values for "
                    + hours.length + " times");
        }
        if (!measurementIds.isEmpty() && measurementIds.size() != values.length) {
            throw new IllegalArgumentException("trace " + compound + ": " + measurementIds.size()
                    + " measurement ids for " + values.length + " values");
        }
        flagged = (BitSet) flagged.clone();
        measurementIds = List.copyOf(measurementIds);
    }

    /** A trace whose values are not tied to stored measurements (e.g. of a run not yet stored). */
    public ConcentrationTrace(String compound, String unit, double[] hours, double[] values, BitSet flagged) {
        this(compound, unit, hours, values, flagged, List.of());
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
