package org.tracegas.qa.basis;

import org.tracegas.qa.internal.Require;

/**
 * A cell temperature (K) or pressure (kPa) with where it came from.
 *
 * @param value  the value, positive
 * @param origin where it came from
 */
public record ConditionValue(double value, ConditionOrigin origin) {

    public ConditionValue {
        Require.positive("value", value);
        Require.notNull("origin", origin);
    }

    /**
     * The first value available in the order file label, instrument channel, method statement.
     *
     * @param fileLabel         the file's label, or null when the file has none
     * @param instrumentChannel the side channel's value, or null when none was logged
     * @param methodStated      the method's value, always there
     */
    public static ConditionValue firstOf(Double fileLabel, Double instrumentChannel, double methodStated) {
        if (fileLabel != null) {
            return new ConditionValue(fileLabel, ConditionOrigin.FILE_LABEL);
        }
        if (instrumentChannel != null) {
            return new ConditionValue(instrumentChannel, ConditionOrigin.INSTRUMENT_CHANNEL);
        }
        return new ConditionValue(methodStated, ConditionOrigin.METHOD_STATED);
    }
}
