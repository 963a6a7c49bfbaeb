package org.tracegas.report.internal;

import java.util.List;

/** Argument checks of the report values; messages name the field. */
public final class Check {

    private Check() {
    }

    public static String text(String field, String value) {
        if (value == null || value.isBlank()) {
            throw new IllegalArgumentException(field + " must not be blank");
        }
        return value;
    }

    public static <T> T notNull(String field, T value) {
        if (value == null) {
            throw new IllegalArgumentException(field + " must not be null");
        }
        return value;
    }

    public static <T> List<T> list(String field, List<T> values) {
        notNull(field, values);
        for (int i = 0; i < values.size(); i++) {
            if (values.get(i) == null) {
                throw new IllegalArgumentException(field + " entry " + i + " is null");
            }
        }
        return List.copyOf(values);
    }

    public static double[] finite(String field, double[] values) {
        notNull(field, values);
        for (int i = 0; i < values.length; i++) {
            if (!Double.isFinite(values[i])) {
                throw new IllegalArgumentException(field + " value " + i + " is not finite: " + values[i]);
            }
        }
        return values.clone();
    }
}
