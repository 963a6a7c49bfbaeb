package org.tracegas.ui.parts;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;

import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.FillLayout;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.swtchart.Range;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.tracegas.ui.Screens;
import org.tracegas.ui.chart.RedrawTiming;
import org.tracegas.ui.chart.RegionShading.Band;

class SpectrumPanelTest {

    private Display display;
    private Shell shell;
    private SpectrumPanel panel;

    @BeforeEach
    void open() {
        display = Display.getDefault();
        shell = new Shell(display);
        shell.setLayout(new FillLayout());
        shell.setSize(1200, 800);
        panel = new SpectrumPanel(shell, SWT.NONE);
        shell.open();
        Screens.flush(display);
    }

    @AfterEach
    void close() {
        shell.dispose();
    }

    /** A 32,768-point spectrum from 500 to 4500 cm-1 with a comb of lines, a fit and a residual. */
    static FitDisplay large() {
        int n = 32_768;
        double[] x = new double[n];
        double[] sample = new double[n];
        double[] model = new double[n];
        double[] share = new double[n];
        double[] residual = new double[n];
        java.util.Random r = new java.util.Random(3);
        for (int i = 0; i < n; i++) {
            x[i] = 500 + i * 4000.0 / (n - 1);
            double line = 0.3 * Math.pow(Math.cos(x[i] * 0.7), 40) * Math.exp(-Math.pow((x[i] - 2150) / 300, 2));
            model[i] = line + 0.01;
            share[i] = line;
            residual[i] = 0.002 * r.nextGaussian();
            sample[i] = model[i] + residual[i];
        }
        return new FitDisplay("large", x, sample, model, Map.of("CO", share), residual,
                List.of(new Band(2050, 2250), new Band(2600, 2700)));
    }

    @Test
    void showsSampleFitShareAndResidualWithShadedRegions() throws Exception {
        panel.show(large());
        Screens.flush(display);
        assertNotNull(panel.spectrumChart().getSeriesSet().getSeries(SpectrumPanel.SAMPLE));
        assertNotNull(panel.spectrumChart().getSeriesSet().getSeries(SpectrumPanel.FIT));
        assertNotNull(panel.spectrumChart().getSeriesSet().getSeries("Share CO"));
        assertNotNull(panel.residualChart().getSeriesSet().getSeries(SpectrumPanel.RESIDUAL));
        assertEquals(2, panel.shading().bands().size());
        int width = panel.spectrumChart().getPlotArea().getSize().x;
        int shown = panel.shownPoints(SpectrumPanel.SAMPLE);
        assertTrue(shown > width && shown <= 2 * width + 2, "points drawn " + shown + " for " + width + " columns");
        double ms = RedrawTiming.medianMillis(panel.spectrumChart(), 15);
        double msResidual = RedrawTiming.medianMillis(panel.residualChart(), 15);
        int[] step = {0};
        double zoomMs = RedrawTiming.medianMillis(panel.spectrumChart(), 15, () -> panel.navigation()
                .zoom(panel.spectrumChart(), width / 2, step[0]++ % 2 == 0 ? 0.8 : 1.25));
        System.out.printf("spectrum 32768 points: %d drawn; repaint median %.2f ms (spectrum chart), %.2f ms"
                + " (residual chart); zoom step (re-thinning, both charts) + repaint median %.2f ms%n", shown, ms,
                msResidual, zoomMs);
        assertTrue(zoomMs < 2000, "sanity bound only: " + zoomMs + " ms");
        assertTrue(ms < 2000, "sanity bound only: " + ms + " ms");
        Screens.save(shell, "spectrum-32k");
    }

    @Test
    void wheelZoomAndDragPanMoveBothChartsTogether() {
        panel.show(large());
        Screens.flush(display);
        Range before = panel.spectrumChart().getAxisSet().getXAxis(0).getRange();
        int middle = panel.spectrumChart().getPlotArea().getSize().x / 2;
        panel.navigation().zoom(panel.spectrumChart(), middle, 0.5);
        Range zoomed = panel.spectrumChart().getAxisSet().getXAxis(0).getRange();
        assertEquals((before.upper - before.lower) / 2, zoomed.upper - zoomed.lower, 1e-6);
        Range residual = panel.residualChart().getAxisSet().getXAxis(0).getRange();
        assertEquals(zoomed.lower, residual.lower, 1e-9);
        assertEquals(zoomed.upper, residual.upper, 1e-9);
        panel.navigation().pan(panel.spectrumChart(), 50);
        Range panned = panel.spectrumChart().getAxisSet().getXAxis(0).getRange();
        assertEquals(zoomed.upper - zoomed.lower, panned.upper - panned.lower, 1e-6);
        assertTrue(panned.lower != zoomed.lower);
        // after zooming in, the chart is handed the points of the narrower range only
        assertTrue(panel.shownPoints(SpectrumPanel.SAMPLE) <= 2 * panel.spectrumChart().getPlotArea().getSize().x + 2);
    }

    @Test
    void theMouseWheelZoomsAndALeftDragPans() {
        panel.show(large());
        Screens.flush(display);
        var plot = panel.spectrumChart().getPlotArea().getControl();
        Range before = panel.spectrumChart().getAxisSet().getXAxis(0).getRange();
        org.eclipse.swt.widgets.Event wheel = new org.eclipse.swt.widgets.Event();
        wheel.x = 300;
        wheel.count = 3;
        plot.notifyListeners(SWT.MouseVerticalWheel, wheel);
        Range zoomed = panel.spectrumChart().getAxisSet().getXAxis(0).getRange();
        assertEquals(0.8 * (before.upper - before.lower), zoomed.upper - zoomed.lower, 1e-6);
        org.eclipse.swt.widgets.Event down = new org.eclipse.swt.widgets.Event();
        down.button = 1;
        down.x = 100;
        plot.notifyListeners(SWT.MouseDown, down);
        org.eclipse.swt.widgets.Event move = new org.eclipse.swt.widgets.Event();
        move.x = 160;
        move.stateMask = SWT.BUTTON1;
        plot.notifyListeners(SWT.MouseMove, move);
        Range dragged = panel.spectrumChart().getAxisSet().getXAxis(0).getRange();
        var axis = panel.spectrumChart().getAxisSet().getXAxis(0);
        assertEquals(zoomed.upper - zoomed.lower, dragged.upper - dragged.lower, 1e-6);
        // the wavenumber that was under x = 100 is now under x = 160 (within a pixel)
        double perPixel = (dragged.upper - dragged.lower) / panel.spectrumChart().getPlotArea().getSize().x;
        assertEquals(Math.abs(60 * perPixel), Math.abs(dragged.lower - zoomed.lower), 2 * perPixel);
        assertTrue(axis.isReversed());
    }

    @Test
    void readoutGivesWavenumberAndAbsorbanceUnderTheMouse() {
        panel.show(large());
        Screens.flush(display);
        var plot = panel.spectrumChart().getPlotArea().getControl();
        org.eclipse.swt.widgets.Event move = new org.eclipse.swt.widgets.Event();
        move.x = 200;
        move.y = 100;
        plot.notifyListeners(SWT.MouseMove, move);
        double wn = panel.spectrumChart().getAxisSet().getXAxis(0).getDataCoordinate(200);
        String text = panel.readout().getText();
        assertTrue(text.startsWith(String.format(java.util.Locale.ROOT, "%.2f cm⁻¹", wn)), text);
        assertTrue(text.contains("absorbance"), text);
    }
}
