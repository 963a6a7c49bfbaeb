package org.tracegas.ui.parts;

import java.util.List;

import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swtchart.Chart;
import org.eclipse.swtchart.ILineSeries;
import org.eclipse.swtchart.ILineSeries.PlotSymbolType;
import org.eclipse.swtchart.Range;
import org.tracegas.ui.chart.ChartNavigation;
import org.tracegas.ui.chart.CursorReadout;
import org.tracegas.ui.chart.DecimatedSeries;

/**
 * Concentrations over time, one line per compound, flagged values marked with a cross and limits as red
 * horizontal lines. Long records (a day of one-second values) are thinned per pixel column for drawing.
 */
public final class TimeSeriesPanel extends Composite {

    /** A limit line, e.g. a daily emission limit value. */
    public record Limit(String name, double value) {
    }

    private static final String FLAGS_SUFFIX = " flagged";

    private final Chart chart;
    private final DecimatedSeries data;
    private final Label heading;
    private final ChartNavigation navigation;

    public TimeSeriesPanel(Composite parent, int style) {
        super(parent, style);
        setLayout(new GridLayout(2, false));
        Caution.banner(this, 2);
        heading = new Label(this, SWT.NONE);
        heading.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
        heading.setText("No results loaded.");
        Label readout = new Label(this, SWT.RIGHT);
        GridData rd = new GridData(SWT.END, SWT.CENTER, false, false);
        rd.widthHint = 300;
        readout.setLayoutData(rd);
        chart = ChartStyle.chart(this, "", "Time (h)", "Concentration");
        chart.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true, 2, 1));
        chart.getAxisSet().getYAxis(0).getTick().setFormat(new java.text.DecimalFormat("0.###"));
        data = new DecimatedSeries(chart);
        navigation = new ChartNavigation(this::rethin, chart);
        new CursorReadout(chart, readout, "%.4f h", "concentration");
    }

    /** Shows traces and limit lines over the whole period. */
    public void show(String title, List<ConcentrationTrace> traces, List<Limit> limits) {
        heading.setText(title);
        chart.suspendUpdate(true);
        ChartStyle.removeAllSeries(chart);
        data.clear();
        String unit = traces.isEmpty() ? "" : traces.get(0).unit();
        chart.getAxisSet().getYAxis(0).getTitle().setText("Concentration (" + unit + ")");
        int i = 0;
        for (ConcentrationTrace t : traces) {
            data.put(ChartStyle.line(chart, t.compound(), Palette.compound(i++), 1), t.hours(), t.values());
        }
        for (ConcentrationTrace t : traces) {
            ILineSeries<?> m = ChartStyle.markers(chart, t.compound() + FLAGS_SUFFIX, Palette.LIMIT,
                    PlotSymbolType.CROSS);
            m.setVisibleInLegend(false);
            data.put(m, t.flaggedHours(), t.flaggedValues());
        }
        Range full = data.fullXRange();
        for (Limit l : limits) {
            ILineSeries<?> s = ChartStyle.line(chart, "Limit " + l.name(), Palette.LIMIT, 1);
            if (full != null) {
                data.put(s, new double[] {full.lower, full.upper}, new double[] {l.value(), l.value()});
            }
        }
        if (full != null) {
            chart.getAxisSet().getXAxis(0).setRange(full);
        }
        rethin();
        Range y = data.fullYRange();
        if (y != null) {
            chart.getAxisSet().getYAxis(0).setRange(y);
        }
        chart.suspendUpdate(false);
        chart.redraw();
    }

    private void rethin() {
        data.refresh();
        chart.redraw();
    }

    public ChartNavigation navigation() {
        return navigation;
    }

    public Chart chart() {
        return chart;
    }

    /** Points handed to the chart for a series after thinning. */
    public int shownPoints(String seriesId) {
        return data.shownPoints(seriesId);
    }
}
