package org.tracegas.importer.jcamp.internal;

import java.util.ArrayList;
import java.util.List;

import org.tracegas.importer.ImportException;

/** Splits JCAMP-DX text into labelled data records. */
public final class LdrScanner {

    private LdrScanner() {
    }

    /**
     * The lines of the text, ended by CR LF, LF or CR; the last line is what follows the last end (empty when the
     * text ends with one). A loop rather than a regular expression: this runs over every line of every file.
     */
    static List<String> lines(String text) {
        List<String> lines = new ArrayList<>();
        int start = 0;
        int n = text.length();
        for (int i = 0; i < n; i++) {
            char c = text.charAt(i);
            if (c == '\n' || c == '\r') {
                lines.add(text.substring(start, i));
                if (c == '\r' && i + 1 < n && text.charAt(i + 1) == '\n') {
                    i++;
                }
                start = i + 1;
            }
        }
        lines.add(text.substring(start));
        return lines;
    }

    public static List<Ldr> scan(String text, String source) throws ImportException {
        List<String> lines = lines(text);
        List<Ldr> result = new ArrayList<>();
        String label = null;
        String value = null;
        int start = 0;
        List<String> more = new ArrayList<>();
        for (int i = 0; i < lines.size(); i++) {
            String line = stripComment(lines.get(i));
            String trimmed = line.stripLeading();
            if (i == 0 && trimmed.startsWith("\uFEFF")) {
                trimmed = trimmed.substring(1);
            }
            if (trimmed.startsWith("##")) {
                if (label != null) {
                    result.add(new Ldr(Labels.normalise(label), label, value, trimBlankTail(more), start));
                }
                int eq = trimmed.indexOf('=');
                if (eq < 0) {
                    throw new ImportException(source, i + 1, trimmed,
                            "labelled data record without '=' (expected ##LABEL=value)");
                }
                label = trimmed.substring(2, eq).trim();
                value = trimmed.substring(eq + 1).trim();
                start = i + 1;
                more = new ArrayList<>();
            } else if (label != null) {
                more.add(line);
            } else if (!trimmed.isBlank()) {
                throw new ImportException(source, i + 1, "##TITLE",
                        "text before the first labelled data record; a JCAMP-DX file starts with ##TITLE=");
            }
        }
        if (label != null) {
            result.add(new Ldr(Labels.normalise(label), label, value, trimBlankTail(more), start));
        }
        return result;
    }

    /** "$$" starts a comment that runs to the end of the line (IUPAC JCAMP-DX 4.24, from memory). */
    private static String stripComment(String line) {
        int c = line.indexOf("$$");
        return c < 0 ? line : line.substring(0, c);
    }

    private static List<String> trimBlankTail(List<String> more) {
        int end = more.size();
        while (end > 0 && more.get(end - 1).isBlank()) {
            end--;
        }
        return more.subList(0, end);
    }
}
