package org.tracegas.quantify;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;

import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;

/**
 * Synthetic absorbance of gases for tests: rotational P and R branches of Lorentzian lines around band centres
 * near those of real gases (band centres and line spacings from memory, rounded; shapes are made up). Absorbance
 * is proportional to ppm·m unless a saturation is asked for.
 */
final class SyntheticGas {

    /** 0.5 cm-1 steps from 600 to 4000 cm-1, a common medium-resolution FTIR axis (common practice, no source). */
    static final SpectralAxis AXIS = SpectralAxis.uniform(AxisUnit.WAVENUMBER, 600.0, 0.5, 6801);

    /** Half width at half maximum of every line, in cm-1: a line seen through a 0.5 cm-1 instrument. */
    static final double HWHM = 0.6;

    private final String name;
    private final double[] centres;
    private final double[] strengths; // peak absorbance of each line per ppm·m

    private SyntheticGas(String name, double[] centres, double[] strengths) {
        this.name = name;
        this.centres = centres;
        this.strengths = strengths;
    }

    String name() {
        return name;
    }

    /**
     * A diatomic-like band: lines at centre +/- m spacing (m = 1..lines), thermal envelope m exp(-(m/mMax)^2).
     */
    static SyntheticGas band(String name, double peakPerPpmM, double spacing, int lines, double... centres) {
        List<double[]> list = new ArrayList<>();
        for (double c : centres) {
            double mMax = lines / 2.5;
            double norm = mMax / Math.sqrt(2) * Math.exp(-0.5);
            for (int m = 1; m <= lines; m++) {
                double s = peakPerPpmM * m * Math.exp(-(m / mMax) * (m / mMax)) / norm;
                list.add(new double[] {c - m * spacing, s});
                list.add(new double[] {c + m * spacing - 0.02 * m * m * spacing / lines, s * 1.1});
            }
        }
        return of(name, list);
    }

    /** Irregular lines at pseudo-random positions inside [low, high], like water vapour. */
    static SyntheticGas scattered(String name, double peakPerPpmM, long seed, int lines, double low, double high) {
        Random random = new Random(seed);
        List<double[]> list = new ArrayList<>();
        for (int i = 0; i < lines; i++) {
            list.add(new double[] {low + (high - low) * random.nextDouble(), peakPerPpmM * random.nextDouble()});
        }
        return of(name, list);
    }

    private static SyntheticGas of(String name, List<double[]> lines) {
        double[] c = new double[lines.size()];
        double[] s = new double[lines.size()];
        for (int i = 0; i < c.length; i++) {
            c[i] = lines.get(i)[0];
            s[i] = lines.get(i)[1];
        }
        return new SyntheticGas(name, c, s);
    }

    /** The usual set of eight gases. */
    static List<SyntheticGas> eight() {
        return List.of(
                band("CO", 2e-3, 3.8, 30, 2143),
                band("CO2", 5e-5, 1.6, 45, 2349, 667),
                scattered("H2O", 4e-6, 11, 400, 1300, 2100),
                band("NO", 1.5e-3, 3.4, 25, 1876),
                band("N2O", 2e-3, 0.84, 50, 2224, 1285),
                band("NH3", 3e-3, 10, 8, 950, 1600),
                band("HCl", 3e-3, 20.7, 10, 2886),
                band("CH4", 2e-3, 10, 12, 3019, 1306));
    }

    static SyntheticGas named(String name) {
        return eight().stream().filter(g -> g.name.equals(name)).findFirst().orElseThrow();
    }

    /** Absorbance per ppm·m at each axis point, lines shifted by {@code shift} cm-1 and of half width hwhm. */
    double[] absorptivity(SpectralAxis axis, double shift, double hwhm) {
        double[] a = new double[axis.size()];
        for (int i = 0; i < a.length; i++) {
            double nu = axis.get(i);
            double sum = 0;
            for (int l = 0; l < centres.length; l++) {
                double d = (nu - centres[l] - shift) / hwhm;
                if (Math.abs(d) < 400) {
                    sum += strengths[l] / (1 + d * d);
                }
            }
            a[i] = sum;
        }
        return a;
    }

    /** Reference spectrum at an amount, with an optional saturation A -> A / (1 + saturation A). */
    ReferenceSpectrum reference(double ppmMetres, double saturation) {
        double[] k = absorptivity(AXIS, 0, HWHM);
        double[] a = new double[k.length];
        for (int i = 0; i < a.length; i++) {
            a[i] = saturate(k[i] * ppmMetres, saturation);
        }
        return new ReferenceSpectrum(name, new Spectrum(AXIS, a, Ordinate.ABSORBANCE), ppmMetres);
    }

    static double saturate(double absorbance, double saturation) {
        return absorbance / (1 + saturation * absorbance);
    }
}
