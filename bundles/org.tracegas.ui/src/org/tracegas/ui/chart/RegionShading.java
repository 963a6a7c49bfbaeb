package org.tracegas.ui.chart;

import java.util.List;

import org.eclipse.swt.events.PaintEvent;
import org.eclipse.swt.graphics.Color;
import org.eclipse.swt.graphics.GC;
import org.eclipse.swt.graphics.Point;
import org.eclipse.swtchart.Chart;
import org.eclipse.swtchart.ICustomPaintListener;
import org.eclipse.swtchart.IAxis;

/** Shades wavenumber bands (the analysis regions) behind the series of a chart. */
public final class RegionShading implements ICustomPaintListener {

    /** A band to shade, in axis units. */
    public record Band(double low, double high) {
    }

    private final Chart chart;
    private final Color fill;
    private volatile List<Band> bands = List.of();

    public RegionShading(Chart chart, Color fill) {
        this.chart = chart;
        this.fill = fill;
        chart.getPlotArea().addCustomPaintListener(this);
    }

    public void setBands(List<Band> bands) {
        this.bands = List.copyOf(bands);
    }

    public List<Band> bands() {
        return bands;
    }

    @Override
    public boolean drawBehindSeries() {
        return true;
    }

    @Override
    public void paintControl(PaintEvent e) {
        IAxis x = chart.getAxisSet().getXAxis(0);
        Point size = chart.getPlotArea().getSize();
        GC gc = e.gc;
        Color old = gc.getBackground();
        int alpha = gc.getAlpha();
        gc.setBackground(fill);
        gc.setAlpha(70);
        for (Band b : bands) {
            int a = x.getPixelCoordinate(b.low());
            int c = x.getPixelCoordinate(b.high());
            gc.fillRectangle(Math.min(a, c), 0, Math.max(1, Math.abs(c - a)), size.y);
        }
        gc.setAlpha(alpha);
        gc.setBackground(old);
    }
}
