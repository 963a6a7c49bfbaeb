package org.tracegas.ui.chart;

import java.util.LinkedHashMap;
import java.util.Map;

import org.eclipse.swt.SWT;
import org.eclipse.swt.events.PaintEvent;
import org.eclipse.swt.graphics.Color;
import org.eclipse.swt.graphics.Image;
import org.eclipse.swt.graphics.ImageData;
import org.eclipse.swt.graphics.PaletteData;
import org.eclipse.swt.graphics.Point;
import org.eclipse.swtchart.Chart;
import org.eclipse.swtchart.ICustomPaintListener;
import org.eclipse.swtchart.IAxis;
import org.eclipse.swtchart.ILineSeries;
import org.eclipse.swtchart.LineStyle;
import org.eclipse.swtchart.Range;

/**
 * Draws a chart's line series fast, whatever their length. SWTChart strokes every segment on its own, which
 * costs tens of microseconds per segment in software rendering; here the full data are thinned per pixel
 * column ({@link MinMaxDecimator}), rasterized in Java into one transparent image, and that image is painted
 * over the plot area. The image is kept until the data, the axis ranges or the plot size change, so a plain
 * repaint costs one image copy. The SWTChart series stay in place, without data, for the legend.
 */
public final class DecimatedSeries implements ICustomPaintListener {

    /** A series' data as handed over, with the ranges of its x and y values (null without any). */
    private record Full(double[] x, double[] y, int rgb, boolean markers, boolean dashed, int yAxis, Range xRange,
            Range yRange) {
    }

    private final Chart chart;
    private final Map<String, Full> data = new LinkedHashMap<>();
    private final Map<String, Integer> drawn = new LinkedHashMap<>();
    private Image cache;
    private String cacheKey = "";
    private int version;

    public DecimatedSeries(Chart chart) {
        this.chart = chart;
        chart.enableCompress(true);
        chart.getPlotArea().addCustomPaintListener(this);
        chart.addListener(SWT.Dispose, e -> clearCache());
    }

    /**
     * Gives a series (created beforehand on the chart, and set on its y axis) its full data. A series without
     * line style is drawn as crosses at its points (flag markers), one with a dashed style as a dashed line.
     * The x values must be finite and ascending or descending ({@link MinMaxDecimator}). The arrays are kept,
     * not copied, and must not be changed afterwards: copies of a day of one-second values of twenty compounds
     * would be 28 MB per display, more than all the drawing costs.
     */
    public void put(ILineSeries<?> series, double[] x, double[] y) {
        if (x.length != y.length) {
            throw new IllegalArgumentException("series " + series.getId() + ": y has " + y.length
                    + " points, x has " + x.length);
        }
        boolean markers = series.getLineStyle() == LineStyle.NONE;
        Color c = markers ? series.getSymbolColor() : series.getLineColor();
        data.put(series.getId(), new Full(x, y, (c.getRed() << 16) | (c.getGreen() << 8) | c.getBlue(), markers,
                series.getLineStyle() == LineStyle.DASH, series.getYAxisId(),
                x.length == 0 ? null : new Range(x[0], x[x.length - 1]), range(y)));
        series.setXSeries(new double[0]);
        series.setYSeries(new double[0]);
        version++;
    }

    public void clear() {
        data.clear();
        drawn.clear();
        version++;
    }

    /** The x range that shows all data, or null without data. */
    public Range fullXRange() {
        return range(true, -1);
    }

    /** The y range of all data with 5 % head room above and below, or null without data. */
    public Range fullYRange() {
        return fullYRange(0);
    }

    /** The y range of the data on y axis {@code axisId} with 5 % head room, or null without data there. */
    public Range fullYRange(int axisId) {
        Range r = range(false, axisId);
        if (r == null) {
            return null;
        }
        double pad = 0.05 * (r.upper - r.lower);
        return new Range(r.lower - pad, r.upper + pad);
    }

    /** Range of the x values of all data, or of the y values on one axis; from the ranges found by put. */
    private Range range(boolean x, int axisId) {
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (Full f : data.values()) {
            Range r = x ? f.xRange : f.yRange;
            if (r != null && (x || f.yAxis == axisId)) {
                lo = Math.min(lo, r.lower);
                hi = Math.max(hi, r.upper);
            }
        }
        if (!(lo <= hi)) {
            return null;
        }
        return lo < hi ? new Range(lo, hi) : new Range(lo - 1, hi + 1);
    }

    /** Lowest and highest value that is not NaN, or null without any. */
    private static Range range(double[] values) {
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (double v : values) {
            // NaN fails both comparisons, so gaps are skipped without a test of their own
            if (v < lo) {
                lo = v;
            }
            if (v > hi) {
                hi = v;
            }
        }
        return lo <= hi ? new Range(lo, hi) : null;
    }

    /** Marks the picture out of date and repaints (after a zoom, pan or new data). */
    public void refresh() {
        version++;
        chart.redraw();
    }

    /** Points drawn for a series at the last paint (after thinning). */
    public int shownPoints(String seriesId) {
        ensurePicture();
        return drawn.getOrDefault(seriesId, 0);
    }

    @Override
    public boolean drawBehindSeries() {
        return false;
    }

    @Override
    public void paintControl(PaintEvent e) {
        Image img = ensurePicture();
        if (img != null) {
            e.gc.drawImage(img, 0, 0);
        }
    }

    private Image ensurePicture() {
        Point size = chart.getPlotArea().getSize();
        if (size.x < 2 || size.y < 2 || data.isEmpty()) {
            return null;
        }
        Range xr = chart.getAxisSet().getXAxis(0).getRange();
        StringBuilder yRanges = new StringBuilder();
        for (IAxis y : chart.getAxisSet().getYAxes()) {
            yRanges.append(y.getId()).append(':').append(y.getRange()).append(' ');
        }
        boolean reversed = chart.getAxisSet().getXAxis(0).isReversed();
        String key = size + " " + xr + " " + yRanges + reversed + " " + version;
        if (!key.equals(cacheKey) || cache == null) {
            clearCache();
            cache = new Image(chart.getDisplay(), render(size.x, size.y, xr, reversed));
            cacheKey = key;
        }
        return cache;
    }

    private ImageData render(int w, int h, Range xr, boolean reversed) {
        Raster raster = new Raster(w, h);
        drawn.clear();
        for (Map.Entry<String, Full> e : data.entrySet()) {
            Full f = e.getValue();
            IAxis yAxis = chart.getAxisSet().getYAxis(f.yAxis);
            if (yAxis == null) {
                continue;
            }
            Range yr = yAxis.getRange();
            MinMaxDecimator.Decimated d = MinMaxDecimator.decimate(f.x, f.y, xr.lower, xr.upper, w);
            drawn.put(e.getKey(), d.size());
            double sx = (w - 1) / (xr.upper - xr.lower);
            double sy = (h - 1) / (yr.upper - yr.lower);
            double px = Double.NaN;
            double py = Double.NaN;
            for (int i = 0; i < d.size(); i++) {
                double y = d.y()[i];
                if (Double.isNaN(y)) {
                    px = Double.NaN;
                    continue;
                }
                double cx = (d.x()[i] - xr.lower) * sx;
                if (reversed) {
                    cx = (w - 1) - cx;
                }
                double cy = (yr.upper - y) * sy;
                if (f.markers) {
                    raster.cross((int) Math.round(cx), (int) Math.round(cy), 3, f.rgb);
                } else if (!Double.isNaN(px)) {
                    raster.line(px, py, cx, cy, f.rgb, f.dashed);
                }
                px = cx;
                py = cy;
            }
        }
        return raster.toImageData();
    }

    private void clearCache() {
        if (cache != null) {
            cache.dispose();
            cache = null;
        }
    }

    /**
     * An RGB picture with a coverage mask, drawn into with one-pixel lines. The pixels go straight into the
     * image data's bytes: no second copy of the picture to convert.
     */
    static final class Raster {
        private final int w;
        private final int h;
        private final ImageData image;
        private final byte[] alpha;
        /** Pixels per dash and per gap of a dashed line. */
        private static final int DASH = 6;
        private int dashStep;

        Raster(int w, int h) {
            this.w = w;
            this.h = h;
            image = new ImageData(w, h, 24, new PaletteData(0xFF0000, 0xFF00, 0xFF));
            alpha = new byte[w * h];
        }

        void set(int x, int y, int colour) {
            if (x >= 0 && x < w && y >= 0 && y < h) {
                // 24 bits with these masks: red, green, blue bytes in that order (as ImageData.setPixel)
                int i = y * image.bytesPerLine + 3 * x;
                image.data[i] = (byte) (colour >> 16);
                image.data[i + 1] = (byte) (colour >> 8);
                image.data[i + 2] = (byte) colour;
                alpha[y * w + x] = (byte) 255;
            }
        }

        /** A line clipped to the picture (Liang-Barsky), then stepped pixel by pixel (Bresenham). */
        void line(double x0, double y0, double x1, double y1, int colour, boolean dashed) {
            double[] t = {0, 1};
            double dx = x1 - x0;
            double dy = y1 - y0;
            if (!clip(-dx, x0, t) || !clip(dx, w - 1 - x0, t) || !clip(-dy, y0, t) || !clip(dy, h - 1 - y0, t)) {
                return;
            }
            int ax = (int) Math.round(x0 + t[0] * dx);
            int ay = (int) Math.round(y0 + t[0] * dy);
            int bx = (int) Math.round(x0 + t[1] * dx);
            int by = (int) Math.round(y0 + t[1] * dy);
            int sx = ax < bx ? 1 : -1;
            int sy = ay < by ? 1 : -1;
            int ex = Math.abs(bx - ax);
            int ey = -Math.abs(by - ay);
            int err = ex + ey;
            while (true) {
                // the dash pattern runs on across segments: thinned lines are made of very short ones
                if (!dashed || (dashStep++ / DASH) % 2 == 0) {
                    set(ax, ay, colour);
                }
                if (ax == bx && ay == by) {
                    return;
                }
                int e2 = 2 * err;
                if (e2 >= ey) {
                    err += ey;
                    ax += sx;
                }
                if (e2 <= ex) {
                    err += ex;
                    ay += sy;
                }
            }
        }

        private static boolean clip(double p, double q, double[] t) {
            if (p == 0) {
                return q >= 0;
            }
            double r = q / p;
            if (p < 0) {
                if (r > t[1]) {
                    return false;
                }
                t[0] = Math.max(t[0], r);
            } else {
                if (r < t[0]) {
                    return false;
                }
                t[1] = Math.min(t[1], r);
            }
            return true;
        }

        void cross(int x, int y, int half, int colour) {
            for (int k = -half; k <= half; k++) {
                set(x + k, y + k, colour);
                set(x + k, y - k, colour);
            }
        }

        ImageData toImageData() {
            image.alphaData = alpha;
            return image;
        }
    }
}
