package org.tracegas.report;

import java.util.List;

import org.tracegas.report.internal.Check;

/** A measured absorbance spectrum with the fitted model, shown as a fit plot and a residual plot. */
public final class SpectrumFit {

    private final String title;
    private final double[] wavenumbers;
    private final double[] measured;
    private final double[] fitted;

    public SpectrumFit(String title, double[] wavenumbers, double[] measured, double[] fitted) {
        this.title = Check.text("spectrum title", title);
        this.wavenumbers = Check.finite("wavenumbers of " + title, wavenumbers);
        this.measured = Check.finite("measured of " + title, measured);
        this.fitted = Check.finite("fitted of " + title, fitted);
        if (measured.length != wavenumbers.length || fitted.length != wavenumbers.length) {
            throw new IllegalArgumentException("spectrum " + title + ": wavenumbers, measured and fitted differ in "
                    + "length (" + wavenumbers.length + ", " + measured.length + ", " + fitted.length + ")");
        }
    }

    public String title() {
        return title;
    }

    public double[] wavenumbers() {
        return wavenumbers.clone();
    }

    public double[] measured() {
        return measured.clone();
    }

    public double[] fitted() {
        return fitted.clone();
    }

    /** measured − fitted. */
    public double[] residual() {
        double[] r = new double[measured.length];
        for (int i = 0; i < r.length; i++) {
            r[i] = measured[i] - fitted[i];
        }
        return r;
    }

    /** The fit plot: measured and fitted absorbance. */
    public Plot fitPlot() {
        return new Plot(title, "Wavenumber (cm-1)", "Absorbance",
                List.of(new Series("measured", wavenumbers, measured), new Series("fitted", wavenumbers, fitted)),
                true);
    }

    /** The residual plot. */
    public Plot residualPlot() {
        return new Plot(title + ": residual", "Wavenumber (cm-1)", "Residual absorbance",
                List.of(new Series("measured - fitted", wavenumbers, residual())), true);
    }
}
