package org.tracegas.ui.chart;

import java.util.ArrayList;
import java.util.List;

import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Event;
import org.eclipse.swtchart.Chart;
import org.eclipse.swtchart.IAxis;
import org.eclipse.swtchart.Range;

/**
 * Mouse wheel zooms the x axis about the point under the mouse; dragging with the left button pans it.
 * Several charts can be linked so that they keep the same x range (spectrum above, residual below).
 */
public final class ChartNavigation {

    /** Zoom factor per wheel notch. */
    static final double STEP = 0.8;

    private final List<Chart> charts = new ArrayList<>();
    private final Runnable onRangeChange;
    private int dragX = -1;

    /**
     * @param onRangeChange run after every zoom or pan (e.g. to re-thin series and redraw)
     */
    public ChartNavigation(Runnable onRangeChange, Chart... linked) {
        this.onRangeChange = onRangeChange;
        for (Chart c : linked) {
            charts.add(c);
            Control plot = c.getPlotArea().getControl();
            plot.addListener(SWT.MouseVerticalWheel, e -> zoom(c, e.x, e.count > 0 ? STEP : 1 / STEP));
            plot.addListener(SWT.MouseDown, e -> dragX = e.button == 1 ? e.x : -1);
            plot.addListener(SWT.MouseUp, e -> dragX = -1);
            plot.addListener(SWT.MouseMove, e -> drag(c, e));
        }
    }

    /** Zooms about pixel {@code x} of {@code source}'s plot area; factor below 1 zooms in. */
    public void zoom(Chart source, int x, double factor) {
        IAxis axis = source.getAxisSet().getXAxis(0);
        double centre = axis.getDataCoordinate(x);
        Range r = axis.getRange();
        apply(new Range(centre - (centre - r.lower) * factor, centre + (r.upper - centre) * factor));
    }

    /** Shifts the x range by {@code pixels} of {@code source}'s plot area (positive: content moves right). */
    public void pan(Chart source, int pixels) {
        IAxis axis = source.getAxisSet().getXAxis(0);
        double delta = axis.getDataCoordinate(0) - axis.getDataCoordinate(pixels);
        Range r = axis.getRange();
        apply(new Range(r.lower + delta, r.upper + delta));
    }

    private void drag(Chart c, Event e) {
        if (dragX < 0 || (e.stateMask & SWT.BUTTON1) == 0) {
            return;
        }
        pan(c, e.x - dragX);
        dragX = e.x;
    }

    private void apply(Range r) {
        if (!(r.upper > r.lower)) {
            return;
        }
        for (Chart c : charts) {
            c.getAxisSet().getXAxis(0).setRange(r);
        }
        onRangeChange.run();
    }
}
