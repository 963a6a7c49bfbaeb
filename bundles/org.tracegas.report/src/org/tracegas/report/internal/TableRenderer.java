package org.tracegas.report.internal;

import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;

import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.apache.pdfbox.pdmodel.font.PDFont;

/**
 * A table with wrapped cells that continues over pages, repeating its header on each page.
 */
public final class TableRenderer {

    /** A column: header text, width in points and alignment. */
    public record Column(String header, float width, boolean rightAligned) {
    }

    private static final float PAD = 2.5f;

    private final List<Column> columns;
    private final float size;
    private final Set<String> alarmWords;

    /**
     * @param alarmWords cell texts drawn in bold red, for example "FAIL"
     */
    public TableRenderer(List<Column> columns, float size, Set<String> alarmWords) {
        this.columns = List.copyOf(columns);
        this.size = size;
        this.alarmWords = Set.copyOf(alarmWords);
    }

    public void draw(PageWriter pw, List<String[]> rows) {
        for (int i = 0; i < rows.size(); i++) {
            if (rows.get(i).length != columns.size()) {
                throw new IllegalArgumentException("table row " + i + " has " + rows.get(i).length
                        + " cells for " + columns.size() + " columns");
            }
        }
        String[] header = columns.stream().map(Column::header).toArray(String[]::new);
        List<List<String>> headerLines = wrapRow(pw.bold(), header);
        float headerHeight = height(headerLines);
        boolean first = true;
        for (String[] row : rows) {
            List<List<String>> lines = wrapRow(pw.regular(), row);
            float h = height(lines);
            if (first || pw.y() - h < pw.bottom()) {
                pw.ensure(headerHeight + h);
                drawRow(pw, headerLines, headerHeight, true);
                first = false;
            }
            drawRow(pw, lines, h, false);
        }
        if (first) {
            pw.ensure(headerHeight);
            drawRow(pw, headerLines, headerHeight, true);
        }
        pw.down(8);
    }

    private List<List<String>> wrapRow(PDFont font, String[] cells) {
        List<List<String>> out = new ArrayList<>(cells.length);
        for (int c = 0; c < cells.length; c++) {
            out.add(PdfText.wrap(font, size, cells[c] == null ? "" : cells[c], columns.get(c).width() - 2 * PAD));
        }
        return out;
    }

    private float height(List<List<String>> lines) {
        int max = lines.stream().mapToInt(List::size).max().orElse(1);
        return max * size * 1.25f + 2 * PAD;
    }

    private void drawRow(PageWriter pw, List<List<String>> lines, float h, boolean header) {
        try {
            PDPageContentStream cs = pw.stream();
            float top = pw.y();
            if (header) {
                cs.setNonStrokingColor(0.88f);
                cs.addRect(pw.left(), top - h, totalWidth(), h);
                cs.fill();
                cs.setNonStrokingColor(0f);
            }
            float x = pw.left();
            for (int c = 0; c < columns.size(); c++) {
                Column col = columns.get(c);
                float baseline = top - PAD - size;
                for (String line : lines.get(c)) {
                    boolean alarm = !header && alarmWords.contains(line);
                    PDFont font = header || alarm ? pw.bold() : pw.regular();
                    float tx = col.rightAligned() ? x + col.width() - PAD - PdfText.width(font, size, line) : x + PAD;
                    if (alarm) {
                        cs.setNonStrokingColor(0.75f, 0.05f, 0.05f);
                    }
                    pw.text(font, size, tx, baseline, line);
                    if (alarm) {
                        cs.setNonStrokingColor(0f);
                    }
                    baseline -= size * 1.25f;
                }
                x += col.width();
            }
            pw.down(h);
            pw.line(pw.left(), pw.y(), pw.left() + totalWidth(), pw.y(), header ? 0.7f : 0.3f, header ? 0.3f : 0.7f);
        } catch (IOException e) {
            throw new IllegalStateException("cannot draw a table row", e);
        }
    }

    private float totalWidth() {
        float w = 0;
        for (Column c : columns) {
            w += c.width();
        }
        return w;
    }
}
