package org.tracegas.importer.jcamp.internal;

import java.util.List;

/**
 * One labelled data record: {@code ##LABEL=value}, possibly continued over further lines.
 *
 * @param label      normalised label ({@link Labels#normalise})
 * @param rawLabel   label as written
 * @param value      text after '=' on the label's line, comment removed, trimmed
 * @param more       following lines up to the next label, comments removed
 * @param line       1-based line of the label
 */
public record Ldr(String label, String rawLabel, String value, List<String> more, int line) {

    public Ldr {
        more = List.copyOf(more);
    }

    /** The value including continuation lines, joined by line breaks and trimmed. */
    public String fullValue() {
        if (more.isEmpty()) {
            return value;
        }
        StringBuilder b = new StringBuilder(value);
        for (String m : more) {
            b.append('\n').append(m);
        }
        return b.toString().trim();
    }

    /** 1-based line of the last line belonging to this record. */
    public int lastLine() {
        return line + more.size();
    }
}
