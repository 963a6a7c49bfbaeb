package org.tracegas.ui.parts;

import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.Color;
import org.eclipse.swtchart.Chart;
import org.eclipse.swtchart.ILineSeries;
import org.eclipse.swtchart.ILineSeries.PlotSymbolType;
import org.eclipse.swtchart.ISeries.SeriesType;
import org.eclipse.swtchart.LineStyle;

/** Creates charts and line series in the product's look. */
final class ChartStyle {

    private ChartStyle() {
    }

    static Chart chart(org.eclipse.swt.widgets.Composite parent, String title, String xTitle, String yTitle) {
        Chart c = new Chart(parent, SWT.NONE);
        c.setBackground(new Color(250, 250, 252));
        c.setBackgroundInPlotArea(new Color(255, 255, 255));
        c.getTitle().setText(title);
        c.getTitle().setVisible(!title.isEmpty());
        c.getAxisSet().getXAxis(0).getTitle().setText(xTitle);
        c.getAxisSet().getYAxis(0).getTitle().setText(yTitle);
        c.getLegend().setPosition(SWT.RIGHT);
        // one fixed tick format keeps the plot areas of stacked charts aligned
        c.getAxisSet().getYAxis(0).getTick().setFormat(new java.text.DecimalFormat("0.0000"));
        return c;
    }

    static ILineSeries<?> line(Chart c, String id, Color color, int width) {
        ILineSeries<?> s = (ILineSeries<?>) c.getSeriesSet().createSeries(SeriesType.LINE, id);
        s.setLineColor(color);
        s.setLineWidth(width);
        s.setSymbolType(PlotSymbolType.NONE);
        s.setAntialias(SWT.OFF);
        return s;
    }

    static ILineSeries<?> markers(Chart c, String id, Color color, PlotSymbolType symbol) {
        ILineSeries<?> s = (ILineSeries<?>) c.getSeriesSet().createSeries(SeriesType.LINE, id);
        s.setLineStyle(LineStyle.NONE);
        s.setSymbolType(symbol);
        s.setSymbolColor(color);
        s.setSymbolSize(5);
        return s;
    }

    static void removeAllSeries(Chart c) {
        for (var s : c.getSeriesSet().getSeries()) {
            c.getSeriesSet().deleteSeries(s.getId());
        }
    }
}
