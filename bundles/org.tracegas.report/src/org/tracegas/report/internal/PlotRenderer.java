package org.tracegas.report.internal;

import java.io.IOException;
import java.util.ArrayList;
import java.util.List;

import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.apache.pdfbox.pdmodel.font.PDFont;
import org.apache.pdfbox.util.Matrix;
import org.tracegas.report.Level;
import org.tracegas.report.Plot;
import org.tracegas.report.Series;

/**
 * Draws a line plot with PDF vector graphics: frame, grid, ticks with labels, axis labels, title, legend
 * and one polyline per series. Series with many more points than the plot is wide are reduced to the
 * minimum and maximum per horizontal point, which keeps their envelope.
 */
public final class PlotRenderer {

    private static final float[][] COLOURS = {{0f, 0f, 0f}, {0.80f, 0.10f, 0.10f}, {0.10f, 0.30f, 0.80f},
            {0.10f, 0.55f, 0.20f}, {0.90f, 0.50f, 0.00f}, {0.50f, 0.20f, 0.60f}};
    private static final float TICK_SIZE = 7f;
    private static final float LEFT = 52f;
    private static final float BOTTOM = 30f;
    private static final float TOP = 18f;
    private static final float RIGHT = 8f;

    private final PDFont regular;
    private final PDFont bold;

    public PlotRenderer(PDFont regular, PDFont bold) {
        this.regular = regular;
        this.bold = bold;
    }

    /** Draws the plot into the box with lower left corner (x, y), width w and height h. */
    public void draw(PDPageContentStream cs, Plot plot, float x, float y, float w, float h) throws IOException {
        float px = x + LEFT;
        float py = y + BOTTOM;
        float pw = w - LEFT - RIGHT;
        float ph = h - BOTTOM - TOP;
        double[] range = range(plot);
        AxisScale xs = AxisScale.tight(range[0], range[1], Math.max(3, (int) (pw / 70)));
        AxisScale ys = AxisScale.covering(range[2], range[3], Math.max(3, (int) (ph / 35)));

        text(cs, bold, 9, x, y + h - 10, plot.title());
        grid(cs, plot, xs, ys, px, py, pw, ph);
        curves(cs, plot, xs, ys, px, py, pw, ph);
        levels(cs, plot, ys, px, py, pw, ph);
        cs.setStrokingColor(0f);
        cs.setLineWidth(0.7f);
        cs.addRect(px, py, pw, ph);
        cs.stroke();
        String xl = plot.xLabel();
        text(cs, regular, 8, px + pw / 2 - PdfText.width(regular, 8, xl) / 2, y + 2, xl);
        cs.saveGraphicsState();
        cs.transform(new Matrix(0, 1, -1, 0, x + 9, py + ph / 2
                - PdfText.width(regular, 8, plot.yLabel()) / 2));
        text(cs, regular, 8, 0, 0, plot.yLabel());
        cs.restoreGraphicsState();
        legend(cs, plot, px, py, pw, ph);
    }

    private static double[] range(Plot plot) {
        double[] r = {Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY, Double.POSITIVE_INFINITY,
                Double.NEGATIVE_INFINITY};
        for (Series s : plot.series()) {
            for (double v : s.x()) {
                r[0] = Math.min(r[0], v);
                r[1] = Math.max(r[1], v);
            }
            for (double v : s.y()) {
                r[2] = Math.min(r[2], v);
                r[3] = Math.max(r[3], v);
            }
        }
        for (Level l : plot.levels()) {
            r[2] = Math.min(r[2], l.value());
            r[3] = Math.max(r[3], l.value());
        }
        return r;
    }

    private void grid(PDPageContentStream cs, Plot plot, AxisScale xs, AxisScale ys, float px, float py, float pw,
            float ph) throws IOException {
        cs.setLineWidth(0.3f);
        for (double t : xs.ticks()) {
            float gx = px + (float) (xFraction(plot, xs, t) * pw);
            line(cs, gx, py, gx, py + ph, 0.85f);
            line(cs, gx, py, gx, py - 3, 0f);
            String label = xs.label(t);
            text(cs, regular, TICK_SIZE, gx - PdfText.width(regular, TICK_SIZE, label) / 2, py - 11, label);
        }
        for (double t : ys.ticks()) {
            float gy = py + (float) (ys.fraction(t) * ph);
            line(cs, px, gy, px + pw, gy, 0.85f);
            line(cs, px - 3, gy, px, gy, 0f);
            String label = ys.label(t);
            text(cs, regular, TICK_SIZE, px - 5 - PdfText.width(regular, TICK_SIZE, label), gy - 2.5f, label);
        }
    }

    private static double xFraction(Plot plot, AxisScale xs, double v) {
        double f = xs.fraction(v);
        return plot.reversedX() ? 1 - f : f;
    }

    private void curves(PDPageContentStream cs, Plot plot, AxisScale xs, AxisScale ys, float px, float py, float pw,
            float ph) throws IOException {
        cs.saveGraphicsState();
        cs.addRect(px, py, pw, ph);
        cs.clip();
        cs.setLineWidth(0.6f);
        List<Series> series = plot.series();
        for (int s = 0; s < series.size(); s++) {
            float[] c = COLOURS[s % COLOURS.length];
            cs.setStrokingColor(c[0], c[1], c[2]);
            float[][] pts = points(plot, series.get(s), xs, ys, px, py, pw, ph);
            if (series.get(s).pointsOnly()) {
                cs.setNonStrokingColor(c[0], c[1], c[2]);
                for (float[] p : pts) {
                    cs.addRect(p[0] - 2.2f, p[1] - 2.2f, 4.4f, 4.4f);
                }
                cs.fill();
                cs.setNonStrokingColor(0f);
                continue;
            }
            cs.moveTo(pts[0][0], pts[0][1]);
            for (int i = 1; i < pts.length; i++) {
                cs.lineTo(pts[i][0], pts[i][1]);
            }
            cs.stroke();
        }
        cs.restoreGraphicsState();
    }

    /** Dashed horizontal lines with their names at the left end (the legend sits at the right), above the line. */
    private void levels(PDPageContentStream cs, Plot plot, AxisScale ys, float px, float py, float pw, float ph)
            throws IOException {
        cs.saveGraphicsState();
        cs.setLineWidth(0.6f);
        cs.setStrokingColor(0.35f);
        cs.setLineDashPattern(new float[] {3f, 2f}, 0);
        for (Level l : plot.levels()) {
            float gy = py + (float) (ys.fraction(l.value()) * ph);
            cs.moveTo(px, gy);
            cs.lineTo(px + pw, gy);
            cs.stroke();
            text(cs, regular, 6.5f, px + 3, gy + 1.5f, l.name());
        }
        cs.restoreGraphicsState();
    }

    /** Page coordinates of a series, reduced to min and max per horizontal point when it is dense. */
    private static float[][] points(Plot plot, Series s, AxisScale xs, AxisScale ys, float px, float py, float pw,
            float ph) {
        double[] x = s.x();
        double[] y = s.y();
        int columns = Math.max(1, (int) pw);
        if (x.length <= 3 * columns) {
            float[][] p = new float[x.length][];
            for (int i = 0; i < x.length; i++) {
                p[i] = toPage(plot, xs, ys, x[i], y[i], px, py, pw, ph);
            }
            return p;
        }
        List<float[]> out = new ArrayList<>();
        int i = 0;
        while (i < x.length) {
            int col = (int) Math.floor(xFraction(plot, xs, x[i]) * columns);
            int lo = i;
            int hi = i;
            int j = i;
            while (j < x.length && (int) Math.floor(xFraction(plot, xs, x[j]) * columns) == col) {
                lo = y[j] < y[lo] ? j : lo;
                hi = y[j] > y[hi] ? j : hi;
                j++;
            }
            for (int k : lo <= hi ? new int[] {lo, hi} : new int[] {hi, lo}) {
                out.add(toPage(plot, xs, ys, x[k], y[k], px, py, pw, ph));
            }
            i = j;
        }
        return out.toArray(new float[0][]);
    }

    private static float[] toPage(Plot plot, AxisScale xs, AxisScale ys, double x, double y, float px, float py,
            float pw, float ph) {
        return new float[] {px + (float) (xFraction(plot, xs, x) * pw), py + (float) (ys.fraction(y) * ph)};
    }

    private void legend(PDPageContentStream cs, Plot plot, float px, float py, float pw, float ph) throws IOException {
        float size = 7.5f;
        float widest = 0;
        for (Series s : plot.series()) {
            widest = Math.max(widest, PdfText.width(regular, size, s.name()));
        }
        float boxW = widest + 26;
        float boxH = plot.series().size() * 10 + 4;
        float bx = px + pw - boxW - 4;
        float by = py + ph - boxH - 4;
        cs.setNonStrokingColor(1f);
        cs.addRect(bx, by, boxW, boxH);
        cs.fill();
        cs.setNonStrokingColor(0f);
        cs.setLineWidth(0.3f);
        cs.setStrokingColor(0.6f);
        cs.addRect(bx, by, boxW, boxH);
        cs.stroke();
        for (int s = 0; s < plot.series().size(); s++) {
            float ly = by + boxH - 8 - s * 10;
            float[] c = COLOURS[s % COLOURS.length];
            if (plot.series().get(s).pointsOnly()) {
                cs.setNonStrokingColor(c[0], c[1], c[2]);
                cs.addRect(bx + 8.8f, ly + 0.3f, 4.4f, 4.4f);
                cs.fill();
                cs.setNonStrokingColor(0f);
            } else {
                cs.setStrokingColor(c[0], c[1], c[2]);
                cs.setLineWidth(1.2f);
                cs.moveTo(bx + 4, ly + 2.5f);
                cs.lineTo(bx + 18, ly + 2.5f);
                cs.stroke();
            }
            text(cs, regular, size, bx + 22, ly, plot.series().get(s).name());
        }
        cs.setStrokingColor(0f);
    }

    private static void line(PDPageContentStream cs, float x1, float y1, float x2, float y2, float grey)
            throws IOException {
        cs.setStrokingColor(grey);
        cs.moveTo(x1, y1);
        cs.lineTo(x2, y2);
        cs.stroke();
    }

    private static void text(PDPageContentStream cs, PDFont font, float size, float x, float y, String s)
            throws IOException {
        cs.beginText();
        cs.setFont(font, size);
        cs.newLineAtOffset(x, y);
        cs.showText(PdfText.encodable(font, s));
        cs.endText();
    }
}
