package org.tracegas.qa.internal;

import java.math.BigDecimal;
import java.math.MathContext;

/** Numbers in rule statements and summaries: four significant digits, no trailing zeros (70, 9.5, 0.0005). */
public final class Format {

    private Format() {
    }

    public static String number(double v) {
        if (!Double.isFinite(v)) {
            return Double.toString(v);
        }
        return new BigDecimal(v).round(new MathContext(4)).stripTrailingZeros().toPlainString();
    }
}
