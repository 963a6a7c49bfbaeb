package org.tracegas.library;

/**
 * Where a reference spectrum comes from.
 *
 * @param kind        measured, synthetic or imported
 * @param description free text (instrument and cell, line list and model, or the collection it came from);
 *                    may be empty but not null
 */
public record Origin(OriginKind kind, String description) {

    public Origin {
        if (kind == null) {
            throw new IllegalArgumentException("origin kind must not be null");
        }
        if (description == null) {
            throw new IllegalArgumentException("origin description must not be null (use an empty text)");
        }
    }

    public boolean isSynthetic() {
        return kind == OriginKind.SYNTHETIC;
    }

    @Override
    public String toString() {
        String k = kind.name().toLowerCase(java.util.Locale.ROOT);
        return description.isEmpty() ? k : k + " (" + description + ")";
    }
}
