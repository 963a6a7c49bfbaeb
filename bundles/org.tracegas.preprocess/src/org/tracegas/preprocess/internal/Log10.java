package org.tracegas.preprocess.internal;

/**
 * Decadic logarithm for the absorbance of whole spectra: faster than {@link Math#log10} where that is not an
 * intrinsic, and the same on every platform (plain double arithmetic, no intrinsic that may differ by an ulp),
 * which keeps rebuilt results bit for bit equal.
 * <p>
 * x = 2^e m with m in [1, 2); c = 1 + j/256 is m cut to 8 bits, so r = (m - c) / c lies in [0, 1/256) and
 * log(1 + r) needs six series terms (the seventh is below 1e-17); m - c is exact. For m &gt;= 1.5 the table holds
 * log(c/2) and e is raised by one, so that values just below 1 do not lose digits to cancellation.
 */
public final class Log10 {

    private static final int BITS = 8;
    private static final int SIZE = 1 << BITS;
    private static final double[] LOG_C = new double[SIZE];
    private static final double[] INV_C = new double[SIZE];
    private static final double LN2 = Math.log(2.0);
    private static final double INV_LN10 = 1.0 / Math.log(10.0);

    static {
        for (int j = 0; j < SIZE; j++) {
            double c = 1.0 + (double) j / SIZE;
            LOG_C[j] = j < SIZE / 2 ? StrictMath.log(c) : StrictMath.log(c / 2);
            INV_C[j] = 1.0 / c;
        }
    }

    private Log10() {
    }

    /** log10(x); NaN for x &lt;= 0 or NaN, +Infinity for +Infinity. */
    public static double of(double x) {
        if (!(x >= Double.MIN_NORMAL && x < Double.POSITIVE_INFINITY)) {
            return x > 0 ? StrictMath.log10(x) : Double.NaN;
        }
        long bits = Double.doubleToRawLongBits(x);
        int j = (int) (bits >>> (52 - BITS)) & (SIZE - 1);
        int exponent = (int) (bits >>> 52) - 1023 + (j >>> (BITS - 1));
        double m = Double.longBitsToDouble((bits & 0x000FFFFFFFFFFFFFL) | 0x3FF0000000000000L);
        double r = (m - (1.0 + (double) j / SIZE)) * INV_C[j];
        double series = r * (1.0 + r * (-0.5 + r * (1.0 / 3 + r * (-0.25 + r * (0.2 + r * (-1.0 / 6))))));
        return (exponent * LN2 + (LOG_C[j] + series)) * INV_LN10;
    }
}
