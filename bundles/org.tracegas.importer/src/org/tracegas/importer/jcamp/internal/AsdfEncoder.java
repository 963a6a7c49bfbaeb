package org.tracegas.importer.jcamp.internal;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.List;

/**
 * Writes integer ordinates as ##XYDATA=(X++(Y..Y)) lines in DIFDUP form (IUPAC JCAMP-DX 4.24, from memory):
 * each line starts with its abscissa in AFFN and one ordinate in SQZ form, followed by differences (DIF) whose
 * runs are shortened by repeat counts (DUP). Every line after the first starts with the last ordinate of the
 * line before as Y check value. No line exceeds {@link #MAX_LINE} characters.
 */
public final class AsdfEncoder {

    /** Maximum line length of a JCAMP-DX file (IUPAC JCAMP-DX 4.24, from memory). */
    public static final int MAX_LINE = 80;

    private AsdfEncoder() {
    }

    /**
     * @param y       integer ordinates (as written, before YFACTOR)
     * @param xOfLine abscissa written at the start of a line whose first ordinate has the given index
     */
    public static List<String> encode(long[] y, java.util.function.IntToDoubleFunction xOfLine) {
        List<String> lines = new ArrayList<>();
        int start = 0;
        while (true) {
            StringBuilder line = new StringBuilder(MAX_LINE);
            line.append(affn(xOfLine.applyAsDouble(start))).append(' ').append(sqz(y[start]));
            int i = start + 1;
            while (i < y.length) {
                long d = y[i] - y[i - 1];
                int run = 1;
                while (i + run < y.length && y[i + run] - y[i + run - 1] == d) {
                    run++;
                }
                String token = dif(d) + (run > 1 ? dup(run) : "");
                if (line.length() + token.length() > MAX_LINE) {
                    break;
                }
                line.append(token);
                i += run;
            }
            lines.add(line.toString());
            if (i >= y.length) {
                return lines;
            }
            start = i - 1; // the next line repeats the last ordinate as Y check value
        }
    }

    /** Abscissa with ten significant digits: enough for the check against half a step. */
    static String affn(double x) {
        return new BigDecimal(x).round(new MathContext(10)).stripTrailingZeros().toPlainString();
    }

    public static String sqz(long v) {
        return letter(v, '@', 'A', 'a');
    }

    public static String dif(long v) {
        return letter(v, '%', 'J', 'j');
    }

    public static String dup(int count) {
        String digits = Integer.toString(count);
        int first = digits.charAt(0) - '0';
        return (first == 9 ? "s" : String.valueOf((char) ('S' + first - 1))) + digits.substring(1);
    }

    private static String letter(long v, char zero, char positive, char negative) {
        if (v == 0) {
            return String.valueOf(zero);
        }
        String digits = Long.toString(Math.abs(v));
        int first = digits.charAt(0) - '0';
        char c = (char) ((v > 0 ? positive : negative) + first - 1);
        return c + digits.substring(1);
    }
}
