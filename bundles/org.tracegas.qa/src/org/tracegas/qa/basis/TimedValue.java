package org.tracegas.qa.basis;

import org.tracegas.qa.internal.Require;

/** A value with the time it refers to (start of the measurement). */
public record TimedValue(java.time.Instant time, double value) {

    public TimedValue {
        Require.notNull("time", time);
        Require.finite("value", value);
    }
}
