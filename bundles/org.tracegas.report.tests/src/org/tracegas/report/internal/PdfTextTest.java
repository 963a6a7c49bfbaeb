package org.tracegas.report.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.apache.pdfbox.pdmodel.font.PDType1Font;
import org.apache.pdfbox.pdmodel.font.Standard14Fonts;
import org.junit.jupiter.api.Test;

class PdfTextTest {

    private final PDType1Font helvetica = new PDType1Font(Standard14Fonts.FontName.HELVETICA);

    @Test
    void replacesCharactersOutsideWinAnsi() {
        assertEquals("<= 5 % sigma, -3 mg/m³ ± 2, O2", PdfText.encodable(helvetica, "≤ 5 % σ, −3 mg/m³ ± 2, O₂"));
        assertEquals("?", PdfText.encodable(helvetica, "\u4e2d"));
    }

    @Test
    void wrapsWithinTheWidth() {
        String text = "Mean spike recovery over three spiked samples within 70 .. 130 % of the expected value";
        List<String> lines = PdfText.wrap(helvetica, 8, text, 120);
        assertTrue(lines.size() > 1);
        for (String l : lines) {
            assertTrue(PdfText.width(helvetica, 8, l) <= 120, l);
        }
        assertEquals(text, String.join(" ", lines));
    }

    @Test
    void breaksWordsLongerThanTheWidth() {
        String hash = "868db42e0cbe49c139d8957a54bae38a10cf6edc9f0e9af6ad2f67d0a4cad968";
        List<String> lines = PdfText.wrap(helvetica, 8, hash, 100);
        assertTrue(lines.size() >= 3);
        assertEquals(hash, String.join("", lines));
    }
}
