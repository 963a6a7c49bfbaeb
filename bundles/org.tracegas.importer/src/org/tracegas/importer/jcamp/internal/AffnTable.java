package org.tracegas.importer.jcamp.internal;

import java.util.Arrays;
import java.util.Locale;

import org.tracegas.importer.ImportException;
import org.tracegas.importer.internal.Numbers;

/** Decodes an (XY..XY) table (##XYPOINTS, ##PEAK TABLE): AFFN pairs separated by blanks, commas or semicolons. */
public final class AffnTable {

    /** The pairs in file order and the line of each pair. */
    public record Pairs(double[] x, double[] y, int[] lines) {
    }

    private AffnTable() {
    }

    public static Pairs decode(Ldr table, String source, long maxPoints) throws ImportException {
        String field = "##" + table.rawLabel();
        double[] values = new double[64];
        int[] lines = new int[64];
        int n = 0;
        for (int i = 0; i < table.more().size(); i++) {
            int lineNo = table.line() + 1 + i;
            String text = table.more().get(i).trim();
            int end = 0;
            while (true) {
                int start = end;
                while (start < text.length() && isSeparator(text.charAt(start))) {
                    start++;
                }
                if (start == text.length()) {
                    break;
                }
                end = start;
                while (end < text.length() && !isSeparator(text.charAt(end))) {
                    end++;
                }
                double v = parse(text.substring(start, end), source, lineNo, field);
                if (n / 2 >= maxPoints) {
                    throw new ImportException(source, lineNo, field, "more than " + maxPoints + " points");
                }
                if (n == values.length) {
                    values = Arrays.copyOf(values, 2 * n);
                    lines = Arrays.copyOf(lines, 2 * n);
                }
                values[n] = v;
                lines[n] = lineNo;
                n++;
            }
        }
        if (n == 0) {
            throw new ImportException(source, table.line(), field, "the table holds no points");
        }
        if (n % 2 != 0) {
            throw new ImportException(source, lines[n - 1], field, "the last pair lacks its Y value");
        }
        double[] x = new double[n / 2];
        double[] y = new double[n / 2];
        int[] pairLines = new int[n / 2];
        for (int k = 0; k < n / 2; k++) {
            x[k] = values[2 * k];
            y[k] = values[2 * k + 1];
            pairLines[k] = lines[2 * k];
        }
        return new Pairs(x, y, pairLines);
    }

    /** Blanks (as the regular expression class \\s has them), commas and semicolons separate the values. */
    private static boolean isSeparator(char c) {
        return c == ' ' || c == ',' || c == ';' || c == '\t' || c == '\n' || c == '\u000B' || c == '\f' || c == '\r';
    }

    private static double parse(String token, String source, int lineNo, String field) throws ImportException {
        Double v = Numbers.parseDecimal(token);
        if (v == null) {
            String lower = token.toLowerCase(Locale.ROOT);
            if (lower.contains("nan") || lower.contains("inf")) {
                throw new ImportException(source, lineNo, field, "not a finite number: '" + Numbers.shown(token)
                        + "'");
            }
            throw new ImportException(source, lineNo, field, "malformed number '" + Numbers.shown(token) + "'");
        }
        if (!Double.isFinite(v)) {
            throw new ImportException(source, lineNo, field, "number out of range: '" + Numbers.shown(token) + "'");
        }
        return v;
    }
}
