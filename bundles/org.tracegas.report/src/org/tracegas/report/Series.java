package org.tracegas.report;

import org.tracegas.report.internal.Check;

/** A named curve of a plot: x and y values of equal length; copied in and out. */
public final class Series {

    private final String name;
    private final double[] x;
    private final double[] y;

    public Series(String name, double[] x, double[] y) {
        this.name = Check.text("series name", name);
        this.x = Check.finite("x of " + name, x);
        this.y = Check.finite("y of " + name, y);
        if (x.length != y.length || x.length < 2) {
            throw new IllegalArgumentException("series " + name + " needs x and y of equal length >= 2, had "
                    + x.length + " and " + y.length);
        }
    }

    public String name() {
        return name;
    }

    public double[] x() {
        return x.clone();
    }

    public double[] y() {
        return y.clone();
    }

    public int size() {
        return x.length;
    }
}
