package org.tracegas.report;

import org.tracegas.report.internal.Check;

/** A horizontal line across a plot at a y value, labelled: a limit, a centre line. */
public record Level(String name, double value) {

    public Level {
        Check.text("level name", name);
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException("level " + name + " must be finite, was " + value);
        }
    }
}
