package org.tracegas.ui.parts;

import java.util.List;
import java.util.Map;

import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.SashForm;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swtchart.Chart;
import org.eclipse.swtchart.Range;
import org.tracegas.ui.chart.ChartNavigation;
import org.tracegas.ui.chart.CursorReadout;
import org.tracegas.ui.chart.DecimatedSeries;
import org.tracegas.ui.chart.RegionShading;

/**
 * A fitted sample: sample, fit and each compound's share above, the residual below on the same wavenumber
 * range, analysis windows shaded in both. Wheel zooms, dragging pans, the readout names the point under the
 * mouse.
 */
public final class SpectrumPanel extends Composite {

    public static final String SAMPLE = "Sample";
    public static final String FIT = "Fit";
    public static final String RESIDUAL = "Residual";
    private static final String SHARE_PREFIX = "Share ";

    private final Label heading;
    private final Label readout;
    private final Chart spectrum;
    private final Chart residual;
    private final DecimatedSeries spectrumData;
    private final DecimatedSeries residualData;
    private final RegionShading spectrumShading;
    private final RegionShading residualShading;
    private final ChartNavigation navigation;
    private FitDisplay shown;

    public SpectrumPanel(Composite parent, int style) {
        super(parent, style);
        setLayout(new GridLayout(2, false));
        heading = new Label(this, SWT.WRAP);
        GridData hd = new GridData(SWT.FILL, SWT.CENTER, true, false);
        hd.widthHint = 300; // wraps a long heading (a measurement's results) instead of clipping it
        heading.setLayoutData(hd);
        heading.setText("No spectrum open: select a measurement in the workspace tree, or run a method.");
        readout = new Label(this, SWT.RIGHT);
        GridData rd = new GridData(SWT.END, SWT.CENTER, false, false);
        rd.widthHint = 330;
        readout.setLayoutData(rd);
        SashForm sash = new SashForm(this, SWT.VERTICAL);
        sash.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true, 2, 1));
        spectrum = ChartStyle.chart(sash, "", "Wavenumber (cm⁻¹)", "Absorbance");
        residual = ChartStyle.chart(sash, "", "Wavenumber (cm⁻¹)", "Residual");
        sash.setWeights(3, 1);
        // the residual chart is low: denser tick marks keep its scale labelled
        residual.getAxisSet().getYAxis(0).getTick().setTickMarkStepHint(16);
        spectrumData = new DecimatedSeries(spectrum);
        residualData = new DecimatedSeries(residual);
        spectrumShading = new RegionShading(spectrum, Palette.REGION);
        residualShading = new RegionShading(residual, Palette.REGION);
        navigation = new ChartNavigation(this::rethin, spectrum, residual);
        new CursorReadout(spectrum, readout, "%.2f cm⁻¹", "absorbance");
        new CursorReadout(residual, readout, "%.2f cm⁻¹", "residual");
        // wavenumbers fall to the right, as spectroscopists read them
        spectrum.getAxisSet().getXAxis(0).setReversed(true);
        residual.getAxisSet().getXAxis(0).setReversed(true);
    }

    /** Shows a fit, replacing what was shown, at full wavenumber range. */
    public void show(FitDisplay fit) {
        shown = fit;
        heading.setText(fit.title());
        spectrum.suspendUpdate(true);
        residual.suspendUpdate(true);
        ChartStyle.removeAllSeries(spectrum);
        ChartStyle.removeAllSeries(residual);
        spectrumData.clear();
        residualData.clear();
        spectrumData.put(ChartStyle.line(spectrum, SAMPLE, Palette.SAMPLE, 1), fit.wavenumber(), fit.sample());
        for (Map.Entry<String, double[]> e : fit.shares().entrySet()) {
            spectrumData.put(ChartStyle.line(spectrum, SHARE_PREFIX + e.getKey(), Palette.compound(e.getKey()), 1),
                    fit.wavenumber(), e.getValue());
        }
        if (java.util.Arrays.stream(fit.model()).anyMatch(v -> !Double.isNaN(v))) {
            // a stored spectrum whose fit was not kept has neither: no empty series in the legends
            spectrumData.put(ChartStyle.line(spectrum, FIT, Palette.FIT, 1), fit.wavenumber(), fit.model());
            residualData.put(ChartStyle.line(residual, RESIDUAL, Palette.RESIDUAL, 1), fit.wavenumber(),
                    fit.residual());
        }
        spectrumShading.setBands(fit.windows());
        residualShading.setBands(fit.windows());
        Range full = spectrumData.fullXRange();
        spectrum.getAxisSet().getXAxis(0).setRange(full);
        residual.getAxisSet().getXAxis(0).setRange(full);
        rethin();
        spectrum.getAxisSet().getYAxis(0).setRange(spectrumData.fullYRange());
        if (residualData.fullYRange() != null) { // a stored spectrum without its fit has no residual
            residual.getAxisSet().getYAxis(0).setRange(residualData.fullYRange());
        }
        spectrum.suspendUpdate(false);
        residual.suspendUpdate(false);
        layout(true, true);
        redrawCharts();
    }

    /** Clears the charts and says why, e.g. while a stored spectrum is read. */
    public void showNote(String text) {
        shown = null;
        heading.setText(text);
        ChartStyle.removeAllSeries(spectrum);
        ChartStyle.removeAllSeries(residual);
        spectrumData.clear();
        residualData.clear();
        spectrumShading.setBands(List.of());
        residualShading.setBands(List.of());
        layout(true, true);
        redrawCharts();
    }

    /** The fit shown, or null. */
    public FitDisplay shown() {
        return shown;
    }

    private void rethin() {
        spectrumData.refresh();
        residualData.refresh();
        redrawCharts();
    }

    private void redrawCharts() {
        spectrum.redraw();
        residual.redraw();
    }

    public Chart spectrumChart() {
        return spectrum;
    }

    public Chart residualChart() {
        return residual;
    }

    public ChartNavigation navigation() {
        return navigation;
    }

    public Label readout() {
        return readout;
    }

    public RegionShading shading() {
        return spectrumShading;
    }

    /** Points handed to the chart for a series after thinning. */
    public int shownPoints(String seriesId) {
        return RESIDUAL.equals(seriesId) ? residualData.shownPoints(seriesId) : spectrumData.shownPoints(seriesId);
    }
}
