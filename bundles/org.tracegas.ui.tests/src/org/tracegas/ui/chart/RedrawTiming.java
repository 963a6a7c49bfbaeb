package org.tracegas.ui.chart;

import java.util.Arrays;

import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swtchart.Chart;

/**
 * Times chart repaints: redraw() and update(), then the event loop until the plot area has really painted
 * (on GTK 3 the paint may come with the next frame rather than inside update()).
 */
public final class RedrawTiming {

    private RedrawTiming() {
    }

    /** Median of {@code runs} repaints in milliseconds, after two warm-up repaints. */
    public static double medianMillis(Chart chart, int runs) {
        return medianMillis(chart, runs, () -> { });
    }

    /** As {@link #medianMillis(Chart, int)}, running {@code change} (e.g. a zoom step) before each repaint. */
    public static double medianMillis(Chart chart, int runs, Runnable change) {
        Control plot = chart.getPlotArea().getControl();
        Display display = chart.getDisplay();
        int[] paints = {0};
        plot.addListener(SWT.Paint, e -> paints[0]++);
        double[] t = new double[runs + 2];
        for (int i = 0; i < t.length; i++) {
            int before = paints[0];
            long start = System.nanoTime();
            change.run();
            chart.redraw();
            chart.update();
            long give = System.currentTimeMillis() + 5000;
            while (paints[0] == before && System.currentTimeMillis() < give) {
                if (!display.readAndDispatch()) {
                    Thread.onSpinWait();
                }
            }
            t[i] = (System.nanoTime() - start) / 1e6;
            if (paints[0] == before) {
                throw new AssertionError("the plot area did not repaint within 5 s");
            }
        }
        double[] measured = Arrays.copyOfRange(t, 2, t.length);
        Arrays.sort(measured);
        return measured[runs / 2];
    }
}
