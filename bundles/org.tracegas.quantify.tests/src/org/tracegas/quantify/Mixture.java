package org.tracegas.quantify;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;

import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.Spectrum;

/**
 * A method for the eight synthetic gases and samples of a known mixture with white noise and a sloping baseline.
 */
final class Mixture {

    /** Optical path of the sample cell, m. */
    static final double PATH = 10.0;
    /** Standard deviation of the absorbance noise. */
    static final double NOISE = 5e-4;

    /** True concentrations in ppm at {@link #PATH}. */
    static final Map<String, Double> TRUTH = truth();

    private static Map<String, Double> truth() {
        Map<String, Double> t = new LinkedHashMap<>();
        t.put("CO", 12.0);
        t.put("CO2", 450.0);
        t.put("H2O", 8000.0);
        t.put("NO", 8.0);
        t.put("N2O", 0.35);
        t.put("NH3", 3.0);
        t.put("HCl", 2.0);
        t.put("CH4", 2.5);
        return t;
    }

    /** Reference amount of each gas in ppm·m, above the mixture's amounts. */
    static double referenceAmount(String gas) {
        return switch (gas) {
            case "CO2" -> 10000;
            case "H2O" -> 300000;
            case "CO", "NO" -> 200;
            default -> 100;
        };
    }

    private Mixture() {
    }

    static AnalysisRegion region(double low, double high, int order) {
        return AnalysisRegion.of(low, high, order);
    }

    static AnalysisRegion region(int order, double limit, double... bounds) {
        List<WavenumberWindow> windows = new java.util.ArrayList<>();
        for (int i = 0; i < bounds.length; i += 2) {
            windows.add(new WavenumberWindow(bounds[i], bounds[i + 1]));
        }
        return new AnalysisRegion(windows, order, limit);
    }

    /** The method with every gas as an analyte, each with the interferents that overlap its regions. */
    static QuantificationMethod.Builder method() {
        QuantificationMethod.Builder b = QuantificationMethod.builder("eight gases").pathLengthMetres(PATH)
                .analyte(new Analyte("CO", List.of("H2O", "N2O"),
                        List.of(region(1, Double.POSITIVE_INFINITY, 2040, 2130, 2155, 2200))))
                .analyte(new Analyte("CO2", List.of("CO", "N2O"), List.of(region(2280, 2400, 1))))
                .analyte(new Analyte("H2O", List.of("NO", "NH3", "CH4"), List.of(region(1400, 1500, 1), region(1700, 1800, 1))))
                .analyte(new Analyte("NO", List.of("H2O"), List.of(region(1800, 1950, 1))))
                .analyte(new Analyte("N2O", List.of("CO", "H2O"), List.of(region(2190, 2240, 1))))
                .analyte(new Analyte("NH3", List.of("H2O"), List.of(region(900, 1000, 1), region(1580, 1670, 2))))
                .analyte(new Analyte("HCl", List.of("CH4"), List.of(region(2700, 2980, 1))))
                .analyte(new Analyte("CH4", List.of("HCl", "H2O", "N2O"),
                        List.of(region(2990, 3100, 1), region(1280, 1330, 1))));
        for (SyntheticGas g : SyntheticGas.eight()) {
            b.reference(g.reference(referenceAmount(g.name()), 0));
        }
        return b;
    }

    /** Noise-free absorbance of the mixture in ppm at {@link #PATH}, plus a sloping baseline. */
    static double[] clean(Map<String, Double> ppm) {
        int n = SyntheticGas.AXIS.size();
        double[] a = new double[n];
        for (int i = 0; i < n; i++) {
            a[i] = 0.01 + 2e-6 * (SyntheticGas.AXIS.get(i) - 2000);
        }
        for (Map.Entry<String, Double> e : ppm.entrySet()) {
            double[] k = SyntheticGas.named(e.getKey()).absorptivity(SyntheticGas.AXIS, 0, SyntheticGas.HWHM);
            for (int i = 0; i < n; i++) {
                a[i] += k[i] * e.getValue() * PATH;
            }
        }
        return a;
    }

    static Spectrum noisy(double[] clean, Random random) {
        double[] a = clean.clone();
        for (int i = 0; i < a.length; i++) {
            a[i] += NOISE * random.nextGaussian();
        }
        return new Spectrum(SyntheticGas.AXIS, a, Ordinate.ABSORBANCE);
    }
}
