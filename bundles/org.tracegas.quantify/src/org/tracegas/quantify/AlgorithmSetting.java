package org.tracegas.quantify;

import java.util.regex.Pattern;

/**
 * One input a {@link FitAlgorithm} takes from the method besides the analytes and references (a line list, a cell
 * condition), bound into the method's canonical text and hash. What the value means is the algorithm's business;
 * a method may give a key several times (one line list per compound, say).
 *
 * @param key   lower-case words joined by '-', for example "line-list"
 * @param value the setting as text, without line breaks
 */
public record AlgorithmSetting(String key, String value) {

    private static final Pattern KEY = Pattern.compile("[a-z][a-z0-9]*(-[a-z0-9]+)*");

    /** @throws IllegalArgumentException naming the key or value that is malformed */
    public AlgorithmSetting {
        if (key == null || !KEY.matcher(key).matches()) {
            throw new IllegalArgumentException("setting key must be lower-case words joined by '-', was " + key);
        }
        if (value == null || value.isBlank() || value.chars().anyMatch(Character::isISOControl)) {
            throw new IllegalArgumentException("setting " + key
                    + " must have a value that is not blank and holds no control characters, was " + value);
        }
    }
}
