package org.tracegas.ui.parts;

import java.util.Arrays;
import java.util.Locale;

/**
 * Tells the major components of a gas (water vapour, carbon dioxide in flue gas: percent level) from the trace
 * gases, so that they can be drawn on an axis of their own and do not flatten the trace gases' lines.
 */
public final class ConcentrationLevel {

    /** One percent by volume in ppm: from this typical level on a compound counts as a major component. */
    public static final double MAJOR_PPM = 10_000;

    /** Values looked at for the typical level; a day of one-second values need not be sorted whole. */
    private static final int SAMPLE = 4096;

    private ConcentrationLevel() {
    }

    /**
     * True when the trace's typical (median) value is at least one percent by volume. Units are ppm, ppb or
     * percent ("%", "vol%", "% v/v"); a trace in any other unit is taken as a trace gas.
     */
    public static boolean major(ConcentrationTrace t) {
        double toPpm = ppmPerUnit(t.unit());
        return !Double.isNaN(toPpm) && median(t.values()) * toPpm >= MAJOR_PPM;
    }

    private static double ppmPerUnit(String unit) {
        String u = unit == null ? "" : unit.toLowerCase(Locale.ROOT).replace(" ", "");
        if (u.equals("ppm") || u.equals("ppmv")) {
            return 1;
        } else if (u.equals("ppb") || u.equals("ppbv")) {
            return 1e-3;
        } else if (u.equals("%") || u.equals("vol%") || u.equals("%vol") || u.equals("%v/v")) {
            return 1e4;
        }
        return Double.NaN;
    }

    /** Median of an evenly spaced sample of at most {@value #SAMPLE} finite values; NaN without any. */
    static double median(double[] values) {
        int step = Math.max(1, values.length / SAMPLE);
        double[] sample = new double[(values.length + step - 1) / step];
        int n = 0;
        for (int i = 0; i < values.length; i += step) {
            if (Double.isFinite(values[i])) {
                sample[n++] = values[i];
            }
        }
        if (n == 0) {
            return Double.NaN;
        }
        Arrays.sort(sample, 0, n);
        return n % 2 == 1 ? sample[n / 2] : 0.5 * (sample[n / 2 - 1] + sample[n / 2]);
    }
}
