package org.tracegas.report;

import org.tracegas.report.internal.Check;

/** A named curve of a plot, or a set of marked points: x and y values of equal length; copied in and out. */
public final class Series {

    private final String name;
    private final double[] x;
    private final double[] y;
    private final boolean points;

    /** A curve through at least two points. */
    public Series(String name, double[] x, double[] y) {
        this(name, x, y, false);
    }

    private Series(String name, double[] x, double[] y, boolean points) {
        this.name = Check.text("series name", name);
        this.x = Check.finite("x of " + name, x);
        this.y = Check.finite("y of " + name, y);
        this.points = points;
        if (x.length != y.length || x.length < (points ? 1 : 2)) {
            throw new IllegalArgumentException("series " + name + " needs x and y of equal length >= "
                    + (points ? 1 : 2) + ", had " + x.length + " and " + y.length);
        }
    }

    /** Points drawn as markers without a line, for example the readings of a control chart that signal. */
    public static Series points(String name, double[] x, double[] y) {
        return new Series(name, x, y, true);
    }

    /** Whether the series is drawn as markers only. */
    public boolean pointsOnly() {
        return points;
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
