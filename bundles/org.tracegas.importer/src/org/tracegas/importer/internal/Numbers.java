package org.tracegas.importer.internal;

import java.util.regex.Pattern;

/** Plain decimal numbers in text formats, checked in time linear in their length. */
public final class Numbers {

    /** Sign, digits with optional fraction (or a fraction alone), optional exponent; no alternative overlaps. */
    private static final Pattern DECIMAL = Pattern.compile("[+-]?(?:\\d++(?:\\.\\d*+)?|\\.\\d++)(?:[eE][+-]?\\d++)?");

    private static final int SHOWN = 40;

    private Numbers() {
    }

    /** The value of a plain decimal number, or null for anything else (hexadecimal, "NaN", "1d" ...). */
    public static Double parseDecimal(String text) {
        return DECIMAL.matcher(text).matches() ? Double.valueOf(text) : null;
    }

    /** The text as shown in an error message: long text is cut so that messages stay readable. */
    public static String shown(String text) {
        return text.length() <= SHOWN ? text : text.substring(0, SHOWN) + "... (" + text.length() + " characters)";
    }
}
