package org.tracegas.ui.chart;

import java.util.Locale;
import java.util.function.DoubleFunction;

import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swtchart.Chart;

/** Writes the data coordinates under the mouse into a label, e.g. "2143.20 cm⁻¹   absorbance 0.01234". */
public final class CursorReadout {

    private final Label label;
    private DoubleFunction<String> xText;
    private final String yName;

    /**
     * @param xFormat format of the x value with its unit, e.g. "%.2f cm⁻¹"
     * @param yName   name of the y quantity, e.g. "absorbance"
     */
    public CursorReadout(Chart chart, Label label, String xFormat, String yName) {
        this.label = label;
        this.xText = x -> String.format(Locale.ROOT, xFormat, x);
        this.yName = yName;
        chart.getPlotArea().getControl().addListener(SWT.MouseMove, e -> show(chart, e.x, e.y));
        chart.getPlotArea().getControl().addListener(SWT.MouseExit, e -> label.setText(""));
    }

    /** Writes the x value from now on as {@code xText} gives it, e.g. as a clock time. */
    public void setXText(DoubleFunction<String> xText) {
        this.xText = xText;
    }

    /** Shows the values at pixel (x, y) of the chart's plot area. */
    public void show(Chart chart, int x, int y) {
        double xv = chart.getAxisSet().getXAxis(0).getDataCoordinate(x);
        double yv = chart.getAxisSet().getYAxis(0).getDataCoordinate(y);
        label.setText(text(xv, yv));
    }

    /** The readout text for a data point. */
    public String text(double x, double y) {
        return xText.apply(x) + "   " + yName + " " + String.format(Locale.ROOT, "%.5f", y);
    }
}
