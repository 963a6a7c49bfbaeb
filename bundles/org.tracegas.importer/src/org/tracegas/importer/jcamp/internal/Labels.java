package org.tracegas.importer.jcamp.internal;

import java.util.Locale;

/** JCAMP-DX label normalisation. */
public final class Labels {

    private Labels() {
    }

    /**
     * The label as compared: spaces, dashes, slashes and underscores removed, upper case (IUPAC JCAMP-DX 4.24,
     * McDonald & Wilks 1988: "##DELTA X", "##DELTAX" and "##Delta_X" are the same label; from memory).
     */
    public static String normalise(String label) {
        StringBuilder b = new StringBuilder(label.length());
        for (int i = 0; i < label.length(); i++) {
            char c = label.charAt(i);
            if (c != ' ' && c != '-' && c != '/' && c != '_' && c != '\t') {
                b.append(c);
            }
        }
        return b.toString().toUpperCase(Locale.ROOT);
    }
}
