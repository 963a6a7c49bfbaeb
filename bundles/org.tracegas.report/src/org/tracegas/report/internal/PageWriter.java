package org.tracegas.report.internal;

import java.io.Closeable;
import java.io.IOException;
import java.util.List;

import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.apache.pdfbox.pdmodel.common.PDRectangle;
import org.apache.pdfbox.pdmodel.font.PDFont;
import org.apache.pdfbox.pdmodel.font.PDType1Font;
import org.apache.pdfbox.pdmodel.font.Standard14Fonts;

/**
 * Flowing layout on A4 pages: a cursor moves down the page and a new page starts when the next block does
 * not fit above the footer.
 */
public final class PageWriter implements Closeable {

    public static final PDRectangle PAGE = PDRectangle.A4;
    public static final float MARGIN = 50f;
    private static final float TOP = PAGE.getHeight() - MARGIN;
    private static final float BOTTOM = 62f;

    private final PDDocument document;
    private final PDFont regular = new PDType1Font(Standard14Fonts.FontName.HELVETICA);
    private final PDFont bold = new PDType1Font(Standard14Fonts.FontName.HELVETICA_BOLD);
    private PDPageContentStream stream;
    private float y;

    public PageWriter(PDDocument document) {
        this.document = document;
    }

    public PDFont regular() {
        return regular;
    }

    public PDFont bold() {
        return bold;
    }

    public float left() {
        return MARGIN;
    }

    public float width() {
        return PAGE.getWidth() - 2 * MARGIN;
    }

    public float y() {
        return y;
    }

    public float bottom() {
        return BOTTOM;
    }

    public PDPageContentStream stream() {
        if (stream == null) {
            newPage();
        }
        return stream;
    }

    public void newPage() {
        try {
            if (stream != null) {
                stream.close();
            }
            PDPage page = new PDPage(PAGE);
            document.addPage(page);
            stream = new PDPageContentStream(document, page);
            y = TOP;
        } catch (IOException e) {
            throw new IllegalStateException("cannot start a report page", e);
        }
    }

    /** Starts a new page unless the given height fits below the cursor. */
    public void ensure(float height) {
        if (stream == null || y - height < BOTTOM) {
            newPage();
        }
    }

    public boolean atPageTop() {
        return stream != null && y == TOP;
    }

    public void down(float distance) {
        y -= distance;
    }

    /**
     * A section heading, kept on one page with the given height of what follows it.
     */
    public void heading(String text, float keepWithNext) {
        ensure(40 + keepWithNext);
        if (!atPageTop()) {
            down(10);
        }
        down(14);
        text(bold, 13, left(), y, text);
        down(4);
        line(left(), y, left() + width(), y, 0.6f, 0.5f);
        down(12);
    }

    public void subheading(String text) {
        ensure(40);
        down(12);
        text(bold, 10, left(), y, text);
        down(8);
    }

    /** Wrapped text across the full width. */
    public void paragraph(String text, float size) {
        paragraph(text, size, left(), width(), regular);
    }

    public void paragraph(String text, float size, float x, float maxWidth, PDFont font) {
        float leading = size * 1.3f;
        for (String line : PdfText.wrap(font, size, text, maxWidth)) {
            ensure(leading);
            down(leading);
            text(font, size, x, y + leading - size, line);
        }
        down(size * 0.5f);
    }

    /** Label and value pairs, the labels in bold. */
    public void keyValues(List<String[]> pairs, float labelWidth) {
        float size = 9.5f;
        for (String[] p : pairs) {
            List<String> lines = PdfText.wrap(regular, size, p[1], width() - labelWidth);
            ensure(lines.size() * size * 1.35f);
            text(bold, size, left(), y - size, p[0]);
            for (String line : lines) {
                down(size * 1.35f);
                text(regular, size, left() + labelWidth, y + size * 1.35f - size, line);
            }
        }
        down(4);
    }

    public void text(PDFont font, float size, float x, float baseline, String text) {
        try {
            PDPageContentStream cs = stream();
            cs.beginText();
            cs.setFont(font, size);
            cs.newLineAtOffset(x, baseline);
            cs.showText(PdfText.encodable(font, text));
            cs.endText();
        } catch (IOException e) {
            throw new IllegalStateException("cannot write report text", e);
        }
    }

    public void line(float x1, float y1, float x2, float y2, float width, float grey) {
        try {
            PDPageContentStream cs = stream();
            cs.setStrokingColor(grey);
            cs.setLineWidth(width);
            cs.moveTo(x1, y1);
            cs.lineTo(x2, y2);
            cs.stroke();
            cs.setStrokingColor(0f);
        } catch (IOException e) {
            throw new IllegalStateException("cannot draw a report line", e);
        }
    }

    /** Footer on every page: a left text and "Page i of n". */
    public void footers(String leftText) throws IOException {
        int n = document.getNumberOfPages();
        for (int i = 0; i < n; i++) {
            PDPage page = document.getPage(i);
            try (PDPageContentStream cs = new PDPageContentStream(document, page,
                    PDPageContentStream.AppendMode.APPEND, true, true)) {
                cs.setStrokingColor(0.6f);
                cs.setLineWidth(0.5f);
                cs.moveTo(left(), 48);
                cs.lineTo(left() + width(), 48);
                cs.stroke();
                cs.beginText();
                cs.setFont(regular, 7.5f);
                cs.newLineAtOffset(left(), 36);
                cs.showText(PdfText.encodable(regular, leftText));
                cs.endText();
                String pageText = "Page " + (i + 1) + " of " + n;
                cs.beginText();
                cs.setFont(regular, 7.5f);
                cs.newLineAtOffset(left() + width() - PdfText.width(regular, 7.5f, pageText), 36);
                cs.showText(pageText);
                cs.endText();
            }
        }
    }

    @Override
    public void close() throws IOException {
        if (stream != null) {
            stream.close();
            stream = null;
        }
    }
}
