package org.tracegas.preprocess.internal;

import java.util.Map;
import java.util.Set;
import java.util.SortedMap;
import java.util.TreeMap;

/** Reads and writes step parameters, with errors that name the step and the parameter. */
public final class StepParameters {

    private final String stepId;
    private final Map<String, String> values;

    /**
     * @param known the keys the step accepts
     * @throws IllegalArgumentException if the map is null or holds an unknown key
     */
    public StepParameters(String stepId, Map<String, String> values, Set<String> known) {
        if (values == null) {
            throw new IllegalArgumentException("step " + stepId + ": parameters must not be null");
        }
        for (String key : values.keySet()) {
            if (!known.contains(key)) {
                throw new IllegalArgumentException("step " + stepId + ": unknown parameter '" + key + "', expected "
                        + new java.util.TreeSet<>(known));
            }
        }
        this.stepId = stepId;
        this.values = values;
    }

    public String text(String key) {
        String v = values.get(key);
        if (v == null) {
            throw new IllegalArgumentException("step " + stepId + ": parameter '" + key + "' is missing");
        }
        return v;
    }

    public double number(String key) {
        String v = text(key);
        try {
            return Double.parseDouble(v);
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException("step " + stepId + ": parameter '" + key + "' is not a number: '" + v
                    + "'", e);
        }
    }

    public int integer(String key, int fallback) {
        String v = values.get(key);
        if (v == null) {
            return fallback;
        }
        try {
            return Integer.parseInt(v);
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException("step " + stepId + ": parameter '" + key + "' is not an integer: '"
                    + v + "'", e);
        }
    }

    /** Runs a constructor and prefixes its argument errors with the step id. */
    public <T> T build(java.util.function.Supplier<T> constructor) {
        try {
            return constructor.get();
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException("step " + stepId + ": " + e.getMessage(), e);
        }
    }

    /** An unmodifiable sorted map of alternating keys and values. */
    public static SortedMap<String, String> of(String... keysAndValues) {
        TreeMap<String, String> m = new TreeMap<>();
        for (int i = 0; i < keysAndValues.length; i += 2) {
            m.put(keysAndValues[i], keysAndValues[i + 1]);
        }
        return java.util.Collections.unmodifiableSortedMap(m);
    }
}
