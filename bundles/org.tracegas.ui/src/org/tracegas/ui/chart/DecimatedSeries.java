package org.tracegas.ui.chart;

import java.util.LinkedHashMap;
import java.util.Map;

import org.eclipse.swt.SWT;
import org.eclipse.swtchart.Chart;
import org.eclipse.swtchart.IAxis;
import org.eclipse.swtchart.ISeries;
import org.eclipse.swtchart.Range;

/**
 * Keeps the full data of a chart's line series and hands the chart only a min/max thinned copy for the
 * visible x range, so that redraws cost the same for 1,000 or 100,000 points. Call {@link #refresh()} after
 * the x range or the chart size changed.
 */
public final class DecimatedSeries {

    private record Full(double[] x, double[] y) {
    }

    private final Chart chart;
    private final Map<String, Full> data = new LinkedHashMap<>();

    public DecimatedSeries(Chart chart) {
        this.chart = chart;
        // SWTChart's own compression drops points that fall on the same pixel; it works on top of ours
        chart.enableCompress(true);
        // the number of pixel columns changes with the plot area's size
        chart.getPlotArea().getControl().addListener(SWT.Resize, e -> refresh());
    }

    /** Gives a series (created beforehand on the chart) its full data. */
    public void put(ISeries<?> series, double[] x, double[] y) {
        if (x.length != y.length) {
            throw new IllegalArgumentException("series " + series.getId() + ": y has " + y.length
                    + " points, x has " + x.length);
        }
        data.put(series.getId(), new Full(x.clone(), y.clone()));
    }

    public void clear() {
        data.clear();
    }

    /** The x range that shows all data, or null without data. */
    public Range fullXRange() {
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (Full f : data.values()) {
            for (double v : f.x) {
                lo = Math.min(lo, v);
                hi = Math.max(hi, v);
            }
        }
        return lo < hi ? new Range(lo, hi) : null;
    }

    /** Re-thins every series for the current x range and plot width. */
    public void refresh() {
        IAxis xAxis = chart.getAxisSet().getXAxis(0);
        Range r = xAxis.getRange();
        int columns = Math.max(1, chart.getPlotArea().getSize().x);
        for (Map.Entry<String, Full> e : data.entrySet()) {
            ISeries<?> s = chart.getSeriesSet().getSeries(e.getKey());
            if (s == null) {
                continue;
            }
            MinMaxDecimator.Decimated d = MinMaxDecimator.decimate(e.getValue().x, e.getValue().y, r.lower, r.upper,
                    columns);
            s.setXSeries(d.x());
            s.setYSeries(d.y());
        }
    }

    /** Points the chart holds for a series now (after thinning). */
    public int shownPoints(String seriesId) {
        ISeries<?> s = chart.getSeriesSet().getSeries(seriesId);
        return s == null ? 0 : s.getXSeries().length;
    }
}
