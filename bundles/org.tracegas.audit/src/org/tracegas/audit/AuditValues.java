package org.tracegas.audit;

import java.util.Map;
import java.util.TreeMap;

/**
 * Canonical text of an object's values for {@link AuditEntry#oldValue()} and {@link AuditEntry#newValue()}:
 * one {@code key=value} line per field, keys sorted, so that equal values always give equal text and a
 * reviewer can compare old and new line by line. Backslash, line feed and carriage return in values are
 * escaped as {@code \\}, {@code \n} and {@code \r}; null values are written as {@code key=\0}.
 */
public final class AuditValues {

    private AuditValues() {
    }

    /**
     * @param fields field name to value ({@code String.valueOf} is used); names must not contain '=' or line breaks
     * @throws IllegalArgumentException naming a key that is blank or contains '=' or a line break
     */
    public static String canonical(Map<String, ?> fields) {
        StringBuilder text = new StringBuilder();
        for (Map.Entry<String, ?> e : new TreeMap<String, Object>(fields).entrySet()) {
            String key = e.getKey();
            if (key.isBlank() || key.indexOf('=') >= 0 || key.indexOf('\n') >= 0 || key.indexOf('\r') >= 0) {
                throw new IllegalArgumentException("fields: key '" + key + "' is blank or contains '=' or a line break");
            }
            text.append(key).append('=');
            if (e.getValue() == null) {
                text.append("\\0");
            } else {
                escape(String.valueOf(e.getValue()), text);
            }
            text.append('\n');
        }
        return text.toString();
    }

    private static void escape(String value, StringBuilder out) {
        for (int i = 0; i < value.length(); i++) {
            char ch = value.charAt(i);
            switch (ch) {
                case '\\' -> out.append("\\\\");
                case '\n' -> out.append("\\n");
                case '\r' -> out.append("\\r");
                default -> out.append(ch);
            }
        }
    }
}
