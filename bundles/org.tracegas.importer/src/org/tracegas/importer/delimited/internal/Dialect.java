package org.tracegas.importer.delimited.internal;

import java.util.List;
import java.util.regex.Pattern;

import org.tracegas.importer.internal.Numbers;

/**
 * Field separator and decimal mark of delimited text, found from the first lines: the separator that splits
 * most lines into the same number (at least two) of fields; tab before semicolon before comma. A decimal comma is
 * only possible with tab or semicolon separators (common practice, no source).
 *
 * @param separator    the field separator
 * @param decimalComma whether numbers use a comma as decimal mark
 */
public record Dialect(char separator, boolean decimalComma) {

    private static final Pattern DECIMAL_COMMA = Pattern.compile("[+-]?\\d++,\\d++(?:[eE][+-]?\\d++)?");
    private static final char[] CANDIDATES = {'\t', ';', ','};

    /**
     * The dialect of the given lines, or null when no separator splits most of them into the same number of
     * fields; single deviating lines are left for the reader to report with their line number.
     */
    public static Dialect detect(List<String> lines) {
        for (char c : CANDIDATES) {
            java.util.Map<Integer, Integer> counts = new java.util.HashMap<>();
            for (String line : lines) {
                counts.merge(split(line, c).length, 1, Integer::sum);
            }
            int fields = 0;
            int most = 0;
            for (java.util.Map.Entry<Integer, Integer> e : counts.entrySet()) {
                if (e.getValue() > most) {
                    most = e.getValue();
                    fields = e.getKey();
                }
            }
            if (fields >= 2 && 2 * most > lines.size()) {
                boolean comma = false;
                if (c != ',') {
                    for (String line : lines) {
                        for (String f : split(line, c)) {
                            comma |= DECIMAL_COMMA.matcher(f.trim()).matches();
                        }
                    }
                }
                return new Dialect(c, comma);
            }
        }
        return null;
    }

    public static String[] split(String line, char separator) {
        return line.split(Pattern.quote(String.valueOf(separator)), -1);
    }

    public String[] fields(String line) {
        String[] f = split(line, separator);
        for (int i = 0; i < f.length; i++) {
            f[i] = unquote(f[i].trim());
        }
        return f;
    }

    /** The number in a field, or null when the field is not a plain decimal number. */
    public Double number(String field) {
        return Numbers.parseDecimal(decimalComma ? field.replace(',', '.') : field);
    }

    public String describe() {
        String sep = switch (separator) {
            case '\t' -> "tab";
            case ';' -> "semicolon";
            default -> "comma";
        };
        return sep + (decimalComma ? ", decimal comma" : ", decimal point");
    }

    private static String unquote(String s) {
        return s.length() >= 2 && s.startsWith("\"") && s.endsWith("\"") ? s.substring(1, s.length() - 1) : s;
    }
}
