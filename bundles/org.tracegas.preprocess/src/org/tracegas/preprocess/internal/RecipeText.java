package org.tracegas.preprocess.internal;

import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

import org.tracegas.preprocess.Recipe;

/**
 * Canonical text of a recipe. First line "recipe 1" (format version), then per step
 * {@code id key=value;key=value}; in ids, keys and values every byte outside [A-Za-z0-9._:,+-] is written as %XX
 * (UTF-8, upper-case hex), so the text is plain ASCII and each recipe has exactly one text.
 */
public final class RecipeText {

    static final String HEADER = "recipe 1";

    private RecipeText() {
    }

    public static String format(List<Recipe.Entry> entries) {
        StringBuilder b = new StringBuilder(HEADER).append('\n');
        for (Recipe.Entry e : entries) {
            b.append(escape(e.stepId()));
            char separator = ' ';
            for (Map.Entry<String, String> p : e.parameters().entrySet()) {
                b.append(separator).append(escape(p.getKey())).append('=').append(escape(p.getValue()));
                separator = ';';
            }
            b.append('\n');
        }
        return b.toString();
    }

    public static List<Recipe.Entry> parse(String text) {
        if (text == null) {
            throw new IllegalArgumentException("recipe text must not be null");
        }
        String[] lines = text.split("\n", -1);
        if (!HEADER.equals(lines[0])) {
            throw new IllegalArgumentException("recipe line 1: expected '" + HEADER + "', found '" + lines[0] + "'");
        }
        List<Recipe.Entry> entries = new ArrayList<>();
        for (int i = 1; i < lines.length; i++) {
            String line = lines[i];
            if (line.isEmpty() && i == lines.length - 1) {
                break; // the final newline
            }
            int number = i + 1;
            int space = line.indexOf(' ');
            String id = unescape(space < 0 ? line : line.substring(0, space), number);
            TreeMap<String, String> parameters = new TreeMap<>();
            if (space >= 0) {
                for (String pair : line.substring(space + 1).split(";", -1)) {
                    int eq = pair.indexOf('=');
                    if (eq <= 0) {
                        throw new IllegalArgumentException("recipe line " + number + ": parameter '" + pair
                                + "' is not key=value");
                    }
                    String key = unescape(pair.substring(0, eq), number);
                    if (parameters.put(key, unescape(pair.substring(eq + 1), number)) != null) {
                        throw new IllegalArgumentException("recipe line " + number + ": parameter '" + key
                                + "' given twice");
                    }
                }
            }
            try {
                entries.add(new Recipe.Entry(id, parameters));
            } catch (IllegalArgumentException e) {
                throw new IllegalArgumentException("recipe line " + number + ": " + e.getMessage(), e);
            }
        }
        return entries;
    }

    static String escape(String s) {
        StringBuilder b = new StringBuilder();
        for (byte c : s.getBytes(StandardCharsets.UTF_8)) {
            if ((c >= 'A' && c <= 'Z') || (c >= 'a' && c <= 'z') || (c >= '0' && c <= '9') || c == '.' || c == '_'
                    || c == ':' || c == ',' || c == '+' || c == '-') {
                b.append((char) c);
            } else {
                b.append('%').append(Character.toUpperCase(Character.forDigit((c >> 4) & 0xF, 16)))
                        .append(Character.toUpperCase(Character.forDigit(c & 0xF, 16)));
            }
        }
        return b.toString();
    }

    static String unescape(String s, int line) {
        byte[] out = new byte[s.length()];
        int n = 0;
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            if (c == '%') {
                int hi = i + 2 < s.length() ? Character.digit(s.charAt(i + 1), 16) : -1;
                int lo = i + 2 < s.length() ? Character.digit(s.charAt(i + 2), 16) : -1;
                if (hi < 0 || lo < 0) {
                    throw new IllegalArgumentException("recipe line " + line + ": bad escape in '" + s + "'");
                }
                out[n++] = (byte) (hi * 16 + lo);
                i += 2;
            } else if (c > ' ' && c < 127 && c != '=' && c != ';') {
                out[n++] = (byte) c;
            } else {
                throw new IllegalArgumentException("recipe line " + line + ": character '" + c + "' must be escaped in '"
                        + s + "'");
            }
        }
        return new String(out, 0, n, StandardCharsets.UTF_8);
    }
}
