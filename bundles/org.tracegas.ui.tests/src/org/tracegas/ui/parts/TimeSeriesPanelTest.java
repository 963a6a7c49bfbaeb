package org.tracegas.ui.parts;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.List;
import java.util.Random;

import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.FillLayout;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.swtchart.ILineSeries;
import org.eclipse.swtchart.ILineSeries.PlotSymbolType;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.tracegas.ui.Screens;
import org.tracegas.ui.chart.RedrawTiming;

class TimeSeriesPanelTest {

    private Display display;
    private Shell shell;

    @BeforeEach
    void open() {
        display = Display.getDefault();
        shell = new Shell(display);
        shell.setLayout(new FillLayout());
        shell.setSize(1200, 800);
    }

    @AfterEach
    void close() {
        shell.dispose();
    }

    @Test
    void aDayOfOneSecondResultsForTwentyCompoundsDrawsThinned() throws Exception {
        TimeSeriesPanel panel = new TimeSeriesPanel(shell, SWT.NONE);
        shell.open();
        Screens.flush(display);
        int n = 86_400;
        double[] hours = new double[n];
        for (int i = 0; i < n; i++) {
            hours[i] = i / 3600.0;
        }
        Random r = new Random(5);
        List<ConcentrationTrace> traces = new ArrayList<>();
        for (int c = 0; c < 20; c++) {
            double[] v = new double[n];
            BitSet flags = new BitSet();
            for (int i = 0; i < n; i++) {
                v[i] = 10 + 3 * c + 2 * Math.sin(i / 5000.0 + c) + 0.5 * r.nextGaussian();
                if (r.nextDouble() < 2e-4) {
                    flags.set(i);
                }
            }
            traces.add(new ConcentrationTrace("gas " + (c + 1), "ppm", hours, v, flags));
        }
        long start = System.nanoTime();
        panel.show("A day, one value per second", traces, List.of(new TimeSeriesPanel.Limit("daily", 60)));
        double showMs = (System.nanoTime() - start) / 1e6;
        long flushStart = System.nanoTime();
        Screens.flush(display);
        System.out.printf("first paint after show %.1f ms%n", (System.nanoTime() - flushStart) / 1e6);
        int width = panel.chart().getPlotArea().getSize().x;
        for (ConcentrationTrace t : traces) {
            assertTrue(panel.shownPoints(t.compound()) <= 2 * width + 2, t.compound());
        }
        ILineSeries<?> flagged = (ILineSeries<?>) panel.chart().getSeriesSet().getSeries("gas 1 flagged");
        assertNotNull(flagged);
        assertEquals(PlotSymbolType.CROSS, flagged.getSymbolType());
        assertTrue(panel.shownPoints("gas 1 flagged") > 0);
        assertNotNull(panel.chart().getSeriesSet().getSeries("Limit daily"));
        assertEquals(2, panel.shownPoints("Limit daily"));
        double ms = RedrawTiming.medianMillis(panel.chart(), 15);
        int[] step = {0};
        double zoomMs = RedrawTiming.medianMillis(panel.chart(), 15,
                () -> panel.navigation().zoom(panel.chart(), width / 2, step[0]++ % 2 == 0 ? 0.8 : 1.25));
        System.out.printf("time series 86400 x 20: show %.1f ms; repaint median %.2f ms; zoom step (re-thinning"
                + " and rasterizing all 41 series) + repaint median %.2f ms; %d columns%n", showMs, ms, zoomMs, width);
        assertTrue(zoomMs < 2000, "sanity bound only: " + zoomMs + " ms");
        assertTrue(ms < 2000, "sanity bound only: " + ms + " ms");
        Screens.save(shell, "time-series-day");
    }
}
