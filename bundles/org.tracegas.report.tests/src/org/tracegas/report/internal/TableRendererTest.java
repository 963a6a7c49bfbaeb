package org.tracegas.report.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;

import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.Test;
import org.tracegas.report.internal.TableRenderer.Column;

class TableRendererTest {

    private final TableRenderer table = new TableRenderer(List.of(new Column("Row", 60, false),
            new Column("Text", 200, false)), 8, Set.of("FAIL"));

    @Test
    void continuesOnNewPagesWithTheHeader() throws IOException {
        List<String[]> rows = new ArrayList<>();
        for (int i = 0; i < 150; i++) {
            rows.add(new String[] {"r" + i, i % 10 == 0 ? "a longer text that wraps onto a second line of the cell"
                    : "short"});
        }
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        try (PDDocument doc = new PDDocument()) {
            try (PageWriter pw = new PageWriter(doc)) {
                table.draw(pw, rows);
            }
            doc.save(out);
        }
        try (PDDocument doc = Loader.loadPDF(out.toByteArray())) {
            assertTrue(doc.getNumberOfPages() >= 3, "pages " + doc.getNumberOfPages());
            PDFTextStripper s = new PDFTextStripper();
            String all = s.getText(doc);
            for (int i = 0; i < 150; i++) {
                assertTrue(all.contains("r" + i + " "), "row " + i);
            }
            for (int p = 1; p <= doc.getNumberOfPages(); p++) {
                s.setStartPage(p);
                s.setEndPage(p);
                assertTrue(s.getText(doc).startsWith("Row Text"), "header on page " + p);
            }
        }
    }

    @Test
    void rowWidthMustMatchColumns() {
        try (PDDocument doc = new PDDocument(); PageWriter pw = new PageWriter(doc)) {
            IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                    () -> table.draw(pw, List.<String[]>of(new String[] {"only one"})));
            assertEquals("table row 0 has 1 cells for 2 columns", e.getMessage());
        } catch (IOException e) {
            throw new IllegalStateException(e);
        }
    }
}
