package org.tracegas.quantify;

/** Validation of compound names, so that the canonical method text stays one token per name. */
final class CompoundNames {

    private CompoundNames() {
    }

    static void require(String name, String field) {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException(field + " must be a non-blank compound name, was "
                    + (name == null ? "null" : "'" + name + "'"));
        }
        for (int i = 0; i < name.length(); i++) {
            char c = name.charAt(i);
            if (Character.isWhitespace(c) || Character.isISOControl(c) || c == '"' || c == '\\') {
                throw new IllegalArgumentException(field + " '" + name
                        + "' must not contain white space, control characters, quotes or backslashes (index " + i
                        + ")");
            }
        }
    }
}
