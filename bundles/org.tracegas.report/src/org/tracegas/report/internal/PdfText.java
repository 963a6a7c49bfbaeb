package org.tracegas.report.internal;

import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import org.apache.pdfbox.pdmodel.font.PDFont;

/**
 * Text for the standard Type 1 fonts: characters outside their WinAnsi encoding are replaced by ASCII
 * spellings, and long text is wrapped to a width.
 */
public final class PdfText {

    private static final Map<Character, String> REPLACEMENTS = Map.ofEntries(Map.entry('\u2212', "-"),
            Map.entry('\u2264', "<="), Map.entry('\u2265', ">="), Map.entry('\u03c3', "sigma"),
            Map.entry('\u03b1', "alpha"), Map.entry('\u03b4', "delta"), Map.entry('\u03b8', "theta"),
            Map.entry('\u2080', "0"), Map.entry('\u2081', "1"), Map.entry('\u2082', "2"), Map.entry('\u2083', "3"),
            Map.entry('\u2192', "->"), Map.entry('\u2248', "~"), Map.entry('\u00a0', " "), Map.entry('\t', " "));

    private PdfText() {
    }

    /** The text with every character the font cannot encode replaced. */
    public static String encodable(PDFont font, String text) {
        StringBuilder sb = new StringBuilder(text.length());
        for (int i = 0; i < text.length(); i++) {
            char ch = text.charAt(i);
            String r = REPLACEMENTS.get(ch);
            if (r != null) {
                sb.append(r);
            } else if (canEncode(font, ch)) {
                sb.append(ch);
            } else {
                sb.append('?');
            }
        }
        return sb.toString();
    }

    private static boolean canEncode(PDFont font, char ch) {
        if (ch < 0x20) {
            return false;
        }
        try {
            font.encode(String.valueOf(ch));
            return true;
        } catch (IOException | IllegalArgumentException e) {
            return false;
        }
    }

    public static float width(PDFont font, float size, String text) {
        try {
            return font.getStringWidth(encodable(font, text)) / 1000f * size;
        } catch (IOException e) {
            throw new IllegalStateException("cannot measure text in font " + font.getName(), e);
        }
    }

    /**
     * Lines of at most the given width, broken at spaces; a word longer than the width is broken inside.
     * Line breaks in the text start new lines.
     */
    public static List<String> wrap(PDFont font, float size, String text, float maxWidth) {
        List<String> lines = new ArrayList<>();
        for (String paragraph : encodable(font, text.replace("\r\n", "\n")).split("\n", -1)) {
            StringBuilder line = new StringBuilder();
            for (String word : paragraph.split(" +")) {
                String candidate = line.length() == 0 ? word : line + " " + word;
                if (width(font, size, candidate) <= maxWidth) {
                    line.setLength(0);
                    line.append(candidate);
                    continue;
                }
                if (line.length() > 0) {
                    lines.add(line.toString());
                    line.setLength(0);
                }
                while (width(font, size, word) > maxWidth && word.length() > 1) {
                    int cut = word.length() - 1;
                    while (cut > 1 && width(font, size, word.substring(0, cut)) > maxWidth) {
                        cut--;
                    }
                    lines.add(word.substring(0, cut));
                    word = word.substring(cut);
                }
                line.append(word);
            }
            lines.add(line.toString());
        }
        return lines;
    }
}
