package org.tracegas.ui.parts;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.tracegas.quantify.CompoundResult;
import org.tracegas.quantify.FitSpectra;
import org.tracegas.quantify.RegionResidual;
import org.tracegas.quantify.WavenumberWindow;
import org.tracegas.spectrum.Spectrum;
import org.tracegas.ui.chart.RegionShading.Band;

/**
 * What the spectrum view draws for one fitted sample: the sample, the fitted model, each compound's share and
 * the residual on the sample axis (NaN where no analyte was fitted), and the analysis windows.
 */
public record FitDisplay(String title, double[] wavenumber, double[] sample, double[] model,
        Map<String, double[]> shares, double[] residual, List<Band> windows) {

    /**
     * Merges the fitted spectra of all analytes of one sample.
     *
     * @throws IllegalArgumentException naming the compound whose result carries no fitted spectra
     */
    public static FitDisplay of(String title, Spectrum sample, List<CompoundResult> results) {
        int n = sample.size();
        double[] model = nanArray(n);
        double[] residual = nanArray(n);
        Map<String, double[]> shares = new LinkedHashMap<>();
        List<Band> windows = new ArrayList<>();
        for (CompoundResult r : results) {
            FitSpectra f = r.spectra().orElseThrow(() -> new IllegalArgumentException("result of "
                    + r.compound() + " carries no fitted spectra (quantify with keepSpectra)"));
            fillMissing(model, f.model());
            fillMissing(residual, f.residual());
            shares.put(r.compound(), f.contribution().toArray());
            for (RegionResidual rr : r.residuals()) {
                for (WavenumberWindow w : rr.region().windows()) {
                    Band b = new Band(w.low(), w.high());
                    if (!windows.contains(b)) {
                        windows.add(b);
                    }
                }
            }
        }
        return new FitDisplay(title, sample.axis().toArray(), sample.toArray(), model, shares, residual, windows);
    }

    /** A stored spectrum whose fit was not kept: the spectrum alone, no model, residual or windows. */
    public static FitDisplay unfitted(String title, Spectrum sample) {
        int n = sample.size();
        return new FitDisplay(title, sample.axis().toArray(), sample.toArray(), nanArray(n), Map.of(), nanArray(n),
                List.of());
    }

    private static double[] nanArray(int n) {
        double[] a = new double[n];
        java.util.Arrays.fill(a, Double.NaN);
        return a;
    }

    private static void fillMissing(double[] into, Spectrum from) {
        for (int i = 0; i < into.length; i++) {
            if (Double.isNaN(into[i])) {
                into[i] = from.get(i);
            }
        }
    }
}
