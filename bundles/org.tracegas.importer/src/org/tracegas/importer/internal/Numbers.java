package org.tracegas.importer.internal;

/** Plain decimal numbers in text formats, checked in time linear in their length. */
public final class Numbers {

    private static final int SHOWN = 40;

    private Numbers() {
    }

    /** The value of a plain decimal number, or null for anything else (hexadecimal, "NaN", "1d" ...). */
    public static Double parseDecimal(String text) {
        return isDecimal(text) ? Double.valueOf(text) : null;
    }

    /**
     * Whether the text is a sign, digits with an optional fraction (or a fraction alone) and an optional exponent:
     * [+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?, checked in one pass without a regular expression, since every
     * value of every imported file goes through here.
     */
    static boolean isDecimal(String text) {
        int n = text.length();
        int i = 0;
        if (i < n && (text.charAt(i) == '+' || text.charAt(i) == '-')) {
            i++;
        }
        int intDigits = digits(text, i);
        i += intDigits;
        int fractionDigits = 0;
        if (i < n && text.charAt(i) == '.') {
            i++;
            fractionDigits = digits(text, i);
            i += fractionDigits;
        }
        if (intDigits == 0 && fractionDigits == 0) {
            return false;
        }
        if (i < n && (text.charAt(i) == 'e' || text.charAt(i) == 'E')) {
            i++;
            if (i < n && (text.charAt(i) == '+' || text.charAt(i) == '-')) {
                i++;
            }
            int exponentDigits = digits(text, i);
            if (exponentDigits == 0) {
                return false;
            }
            i += exponentDigits;
        }
        return i == n;
    }

    /** How many ASCII digits follow from index {@code from}. */
    private static int digits(String text, int from) {
        int i = from;
        while (i < text.length() && text.charAt(i) >= '0' && text.charAt(i) <= '9') {
            i++;
        }
        return i - from;
    }

    /** The text as shown in an error message: long text is cut so that messages stay readable. */
    public static String shown(String text) {
        return text.length() <= SHOWN ? text : text.substring(0, SHOWN) + "... (" + text.length() + " characters)";
    }
}
