package org.tracegas.quantify;

import java.util.List;

/**
 * One analysis region of an analyte: several wavenumber windows that share one polynomial baseline.
 *
 * @param windows          the windows, at least one, not overlapping each other
 * @param baselineOrder    order of the baseline polynomial in wavenumber, 0 (offset) to 3
 * @param residualRmsLimit highest acceptable RMS of the fit residual in this region, in absorbance; positive
 *                         infinity for no limit
 */
public record AnalysisRegion(List<WavenumberWindow> windows, int baselineOrder, double residualRmsLimit) {

    /** Highest baseline order: higher orders start to absorb broad bands of the compounds themselves. */
    public static final int MAX_BASELINE_ORDER = 3;

    /** @throws IllegalArgumentException naming the field that is wrong */
    public AnalysisRegion {
        if (windows == null || windows.isEmpty()) {
            throw new IllegalArgumentException("windows must hold at least one window");
        }
        windows = List.copyOf(windows);
        for (int i = 0; i < windows.size(); i++) {
            for (int j = i + 1; j < windows.size(); j++) {
                if (windows.get(i).overlaps(windows.get(j))) {
                    throw new IllegalArgumentException("windows " + windows.get(i) + " and " + windows.get(j)
                            + " overlap");
                }
            }
        }
        if (baselineOrder < 0 || baselineOrder > MAX_BASELINE_ORDER) {
            throw new IllegalArgumentException(
                    "baselineOrder must be 0.." + MAX_BASELINE_ORDER + ", was " + baselineOrder);
        }
        if (!(residualRmsLimit > 0)) {
            throw new IllegalArgumentException("residualRmsLimit must be positive, was " + residualRmsLimit);
        }
    }

    /** A region of one window without a residual limit. */
    public static AnalysisRegion of(double low, double high, int baselineOrder) {
        return new AnalysisRegion(List.of(new WavenumberWindow(low, high)), baselineOrder,
                Double.POSITIVE_INFINITY);
    }

    public boolean contains(double wavenumber) {
        for (WavenumberWindow w : windows) {
            if (w.contains(wavenumber)) {
                return true;
            }
        }
        return false;
    }

    public boolean overlaps(AnalysisRegion other) {
        for (WavenumberWindow a : windows) {
            for (WavenumberWindow b : other.windows) {
                if (a.overlaps(b)) {
                    return true;
                }
            }
        }
        return false;
    }

    /** Lowest bound of all windows, in cm-1. */
    public double low() {
        return windows.stream().mapToDouble(WavenumberWindow::low).min().getAsDouble();
    }

    /** Highest bound of all windows, in cm-1. */
    public double high() {
        return windows.stream().mapToDouble(WavenumberWindow::high).max().getAsDouble();
    }
}
