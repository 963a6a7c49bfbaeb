package org.tracegas.report.internal;

import java.util.ArrayList;
import java.util.List;

/**
 * Axis range and ticks at 1, 2 or 5 times a power of ten. A covering scale widens the range to whole
 * ticks around the data; a tight scale keeps the data range and puts the ticks inside it.
 */
public final class AxisScale {

    private final double low;
    private final double high;
    private final double step;

    private AxisScale(double low, double high, double step) {
        this.low = low;
        this.high = high;
        this.step = step;
    }

    /** A scale covering [min, max] with about {@code targetTicks} intervals. */
    public static AxisScale covering(double min, double max, int targetTicks) {
        if (!(Double.isFinite(min) && Double.isFinite(max)) || min > max) {
            throw new IllegalArgumentException("axis range must be finite with min <= max, was " + min + " .. " + max);
        }
        if (min == max) {
            double pad = min == 0 ? 1 : Math.abs(min) * 0.1;
            min -= pad;
            max += pad;
        }
        double step = niceStep((max - min) / Math.max(1, targetTicks));
        double lo = Math.floor(min / step + 1e-9) * step;
        double hi = Math.ceil(max / step - 1e-9) * step;
        return new AxisScale(lo, hi, step);
    }

    /** A scale over exactly [min, max] with ticks at the multiples of a nice step inside it. */
    public static AxisScale tight(double min, double max, int targetTicks) {
        AxisScale covering = covering(min, max, targetTicks);
        return min == max ? covering : new AxisScale(min, max, covering.step);
    }

    static double niceStep(double raw) {
        double exp = Math.floor(Math.log10(raw));
        double base = Math.pow(10, exp);
        double f = raw / base;
        double nice = f <= 1 ? 1 : f <= 2 ? 2 : f <= 5 ? 5 : 10;
        return nice * base;
    }

    public double low() {
        return low;
    }

    public double high() {
        return high;
    }

    public double step() {
        return step;
    }

    /** Multiples of the step from low to high. */
    public List<Double> ticks() {
        List<Double> t = new ArrayList<>();
        long first = (long) Math.ceil(low / step - 1e-9);
        long last = (long) Math.floor(high / step + 1e-9);
        for (long i = first; i <= last; i++) {
            t.add(i == 0 ? 0.0 : i * step);
        }
        return t;
    }

    /** Tick label with as many decimals as the step needs. */
    public String label(double value) {
        int decimals = Math.max(0, (int) -Math.floor(Math.log10(step) + 1e-9));
        return Numbers.fixed(value, decimals);
    }

    /** Position of a value in [0, 1] along the axis. */
    public double fraction(double value) {
        return (value - low) / (high - low);
    }
}
