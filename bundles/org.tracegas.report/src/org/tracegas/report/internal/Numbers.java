package org.tracegas.report.internal;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;

/**
 * Number formatting for the report: a value is shown to the decimal place of its uncertainty, the
 * uncertainty with two significant digits (JCGM 100:2008 7.2.6).
 */
public final class Numbers {

    private Numbers() {
    }

    /** Decimal places that show u with two significant digits; 0 for u of 10 or more. */
    public static int decimalsFor(double uncertainty) {
        if (!(uncertainty > 0) || !Double.isFinite(uncertainty)) {
            return 3;
        }
        return Math.max(0, 1 - (int) Math.floor(Math.log10(uncertainty)));
    }

    /** The value and its uncertainty rounded to the same decimal place, e.g. {"23.5", "1.2"}. */
    public static String[] withUncertainty(double value, double uncertainty) {
        int d = decimalsFor(uncertainty);
        return new String[] {fixed(value, d), fixed(uncertainty, d)};
    }

    public static String fixed(double value, int decimals) {
        return BigDecimal.valueOf(value).setScale(decimals, RoundingMode.HALF_EVEN).toPlainString();
    }

    /** Four significant digits without trailing zeros. */
    public static String significant(double value) {
        return new BigDecimal(value).round(new MathContext(4)).stripTrailingZeros().toPlainString();
    }
}
