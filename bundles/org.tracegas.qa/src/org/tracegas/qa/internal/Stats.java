package org.tracegas.qa.internal;

/** Mean and dispersion of a sample. */
public final class Stats {

    private Stats() {
    }

    public static double mean(double[] x) {
        requireValues(x, 1);
        double sum = 0;
        for (double v : x) {
            sum += v;
        }
        return sum / x.length;
    }

    /** Sample standard deviation with n - 1 in the denominator. */
    public static double sampleStandardDeviation(double[] x) {
        requireValues(x, 2);
        return Math.sqrt(sumOfSquaredDeviations(x) / (x.length - 1));
    }

    /** Root-mean-square deviation from the mean with n in the denominator. */
    public static double rmsDeviation(double[] x) {
        requireValues(x, 2);
        return Math.sqrt(sumOfSquaredDeviations(x) / x.length);
    }

    private static double sumOfSquaredDeviations(double[] x) {
        double m = mean(x);
        double s = 0;
        for (double v : x) {
            s += (v - m) * (v - m);
        }
        return s;
    }

    private static void requireValues(double[] x, int minimum) {
        if (x == null || x.length < minimum) {
            throw new IllegalArgumentException("at least " + minimum + " values are needed, got "
                    + (x == null ? 0 : x.length));
        }
        for (int i = 0; i < x.length; i++) {
            if (!Double.isFinite(x[i])) {
                throw new IllegalArgumentException("value " + i + " is not finite: " + x[i]);
            }
        }
    }
}
