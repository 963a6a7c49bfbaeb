package org.tracegas.ui.chart;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;

import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.Color;
import org.eclipse.swt.graphics.GC;
import org.eclipse.swt.graphics.Image;
import org.eclipse.swt.graphics.ImageData;
import org.eclipse.swt.graphics.Point;
import org.eclipse.swt.graphics.RGB;
import org.eclipse.swt.layout.FillLayout;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.swtchart.Chart;
import org.eclipse.swtchart.IAxis;
import org.eclipse.swtchart.ILineSeries;
import org.eclipse.swtchart.ISeries.SeriesType;
import org.eclipse.swtchart.LineStyle;
import org.eclipse.swtchart.Range;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.tracegas.ui.Screens;

// What must be on screen is worked out here from the data and the axes alone (brute force): the pixel of
// each single-value spike, and of a flagged value. Showing every extreme of a thinned line is the point of
// min/max thinning (common practice in plotting, no source).
class DecimatedSeriesTest {

    private static final int N = 86_400;
    private static final RGB LINE = new RGB(0, 0, 255);
    private static final RGB FLAG = new RGB(200, 0, 0);

    private Display display;
    private Shell shell;

    @BeforeEach
    void open() {
        display = Display.getDefault();
        shell = new Shell(display);
        shell.setLayout(new FillLayout());
        shell.setSize(900, 500);
    }

    @AfterEach
    void close() {
        shell.dispose();
    }

    @Test
    void everySpikeAndFlagIsPaintedAtFullRangeAndAfterAZoom() {
        Chart chart = new Chart(shell, SWT.NONE);
        chart.getLegend().setVisible(false);
        DecimatedSeries data = new DecimatedSeries(chart);
        double[] hours = new double[N];
        double[] y = new double[N];
        Random r = new Random(3);
        for (int i = 0; i < N; i++) {
            hours[i] = i / 3600.0;
            y[i] = 10 + 0.2 * r.nextGaussian();
        }
        // single values far off the rest, one second each
        int[] spikes = {5_000, 31_007, 31_020, 62_500, 86_000};
        double[] heights = {25, -4, 22, 18, -2};
        for (int k = 0; k < spikes.length; k++) {
            y[spikes[k]] = heights[k];
        }
        ILineSeries<?> line = (ILineSeries<?>) chart.getSeriesSet().createSeries(SeriesType.LINE, "line");
        line.setLineColor(new Color(LINE));
        ILineSeries<?> flags = (ILineSeries<?>) chart.getSeriesSet().createSeries(SeriesType.LINE, "flags");
        flags.setLineStyle(LineStyle.NONE);
        flags.setSymbolColor(new Color(FLAG));
        data.put(line, hours, y);
        int flagged = 47_000;
        data.put(flags, new double[] {hours[flagged]}, new double[] {y[flagged]});
        chart.getAxisSet().getXAxis(0).setRange(data.fullXRange());
        chart.getAxisSet().getYAxis(0).setRange(data.fullYRange());
        shell.open();
        data.refresh();
        Screens.flush(display);

        ImageData shown = plotPixels(chart);
        assertTrue(data.shownPoints("line") <= 2 * shown.width + 2, "points drawn: " + data.shownPoints("line"));
        for (int k = 0; k < spikes.length; k++) {
            assertPainted(chart, shown, hours[spikes[k]], heights[k], LINE, "spike " + k);
        }
        assertPainted(chart, shown, hours[flagged], y[flagged], FLAG, "flagged value");

        // zoomed to the two spikes 13 s apart: thinned again for the new range, both still drawn
        chart.getAxisSet().getXAxis(0).setRange(new Range(hours[31_000], hours[31_030]));
        data.refresh();
        Screens.flush(display);
        shown = plotPixels(chart);
        assertEquals(31, data.shownPoints("line") - 2, "all 31 values in view and one neighbour on each side");
        assertPainted(chart, shown, hours[31_007], heights[1], LINE, "spike 1 zoomed");
        assertPainted(chart, shown, hours[31_020], heights[2], LINE, "spike 2 zoomed");
    }

    /** The pixel of (x, y) on the chart's axes, or one next to it, has the given colour. */
    private static void assertPainted(Chart chart, ImageData shown, double x, double y, RGB colour, String what) {
        IAxis xAxis = chart.getAxisSet().getXAxis(0);
        IAxis yAxis = chart.getAxisSet().getYAxis(0);
        int px = xAxis.getPixelCoordinate(x);
        int py = Math.max(0, Math.min(shown.height - 1, yAxis.getPixelCoordinate(y)));
        for (int dx = -1; dx <= 1; dx++) {
            for (int dy = -1; dy <= 1; dy++) {
                int cx = px + dx;
                int cy = py + dy;
                if (cx >= 0 && cx < shown.width && cy >= 0 && cy < shown.height
                        && shown.palette.getRGB(shown.getPixel(cx, cy)).equals(colour)) {
                    return;
                }
            }
        }
        throw new AssertionError(what + " not painted near pixel (" + px + ", " + py + "), found "
                + shown.palette.getRGB(shown.getPixel(px, py)));
    }

    /** What the plot area shows, read back from the screen (drawn into an image where that comes back empty). */
    private static ImageData plotPixels(Chart chart) {
        Control plot = chart.getPlotArea().getControl();
        Point size = plot.getSize();
        Image image = new Image(plot.getDisplay(), size.x, size.y);
        try {
            GC gc = new GC(image);
            try {
                plot.print(gc);
            } finally {
                gc.dispose();
            }
            return image.getImageData();
        } finally {
            image.dispose();
        }
    }
}
