package org.tracegas.report.internal;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.util.List;

import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.apache.pdfbox.pdmodel.font.PDType1Font;
import org.apache.pdfbox.pdmodel.font.Standard14Fonts;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.Test;
import org.tracegas.report.Plot;
import org.tracegas.report.Series;

class PlotRendererTest {

    @Test
    void drawsTitleLabelsTicksAndLegend() throws IOException {
        double[] x = new double[5000]; // dense: reduced to min and max per point of width
        double[] y = new double[5000];
        for (int i = 0; i < x.length; i++) {
            x[i] = i * 0.01;
            y[i] = 40 + 30 * Math.sin(i / 300.0);
        }
        Plot plot = new Plot("NH3 slip", "Hours", "mg/m³", List.of(new Series("1-minute", x, y)), false);
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        try (PDDocument doc = new PDDocument()) {
            PDPage page = new PDPage();
            doc.addPage(page);
            try (PDPageContentStream cs = new PDPageContentStream(doc, page)) {
                new PlotRenderer(new PDType1Font(Standard14Fonts.FontName.HELVETICA),
                        new PDType1Font(Standard14Fonts.FontName.HELVETICA_BOLD)).draw(cs, plot, 50, 300, 500, 250);
            }
            doc.save(out);
        }
        assertTrue(out.size() < 60_000, "dense series reduced, " + out.size() + " bytes");
        try (PDDocument doc = Loader.loadPDF(out.toByteArray())) {
            String t = new PDFTextStripper().getText(doc);
            // x 0 .. 49.99 over about 6 intervals: step 10, ticks 0 .. 40 inside the data range;
            // y 10 .. 70 over about 5 intervals: step 20, widened to 0 .. 80 (hand-derived 1-2-5 steps)
            for (String s : new String[] {"NH3 slip", "Hours", "1-minute", "0 10 20 30 40", "0\n20\n40\n60\n80"}) {
                assertTrue(t.replace("\r\n", "\n").contains(s), s + " in [" + t + "]");
            }
        }
    }
}
