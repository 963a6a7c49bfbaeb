package org.tracegas.runner.commands;

import java.util.Arrays;
import java.util.Map;
import java.util.Random;

import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;

/**
 * Spectra of an invented lab's gas cell, made without the product's own models: Lorentz lines of invented
 * compounds (numbers plausible, not real molecular data) give the monochromatic transmittance of a mixture,
 * exp(-ln10 · sum of the compounds' absorbance), on a 0.01 cm-1 grid; a Gaussian instrument line shape of 0.5
 * cm-1 full width at half maximum smooths the transmittance (not the absorbance), and the absorbance is
 * -log10 of what the instrument sees. The strongest lines saturate, so absorbance is not proportional to amount
 * and a mixture's absorbance is not the sum of its compounds' (Beer-Lambert holds only monochromatically;
 * common practice, no source), which is what a fit of references at several amounts must cope with.
 */
final class LabSpectra {

    /** The axis of every spectrum written: 2000..2300 cm-1 at 0.25 cm-1. */
    static final SpectralAxis AXIS = SpectralAxis.uniform(AxisUnit.WAVENUMBER, 2000, 0.25, 1201);
    /** Lorentz half width at half maximum of every line, cm-1: about that of CO in air at 1 atm (from memory). */
    private static final double HWHM = 0.07;
    private static final double FINE = 0.01;
    private static final double ILS_FWHM = 0.5;
    /** Fine grid from 1990 to 2310 cm-1, so that the line shape's wings are inside at the ends of the axis. */
    private static final int FINE_POINTS = 32_001;
    private static final double FINE_FIRST = 1990;

    /** Monochromatic absorbance per ppm·m of each compound on the fine grid. */
    private final Map<String, double[]> perPpmM;

    LabSpectra() {
        perPpmM = Map.of("CO", branch(2143.0, 3.86, 12, 1.93, 6.0e-4), "N2O", series(2205, 5, 7, 0.42, 5.0e-4));
    }

    /** P and R branches around a centre, line strengths shaped like a rotational envelope at 296 K. */
    private static double[] branch(double centre, double spacing, int perBranch, double rotational, double peak) {
        double[] k = new double[FINE_POINTS];
        for (int sign : new int[] { -1, 1 }) {
            for (int j = 0; j < perBranch; j++) {
                double strength = peak * (j + 1) * Math.exp(-rotational * j * (j + 1) * 1.4388 / 296.0);
                addLine(k, centre + sign * spacing * (j + 0.5), strength);
            }
        }
        return k;
    }

    private static double[] series(double first, double spacing, int n, double rotational, double peak) {
        double[] k = new double[FINE_POINTS];
        for (int j = 0; j < n; j++) {
            addLine(k, first + spacing * j, peak * (j + 1) * Math.exp(-rotational * j * (j + 1) * 1.4388 / 296.0));
        }
        return k;
    }

    /** A Lorentz line whose peak monochromatic absorbance per ppm·m is the strength. */
    private static void addLine(double[] k, double centre, double strength) {
        for (int i = 0; i < k.length; i++) {
            double d = (FINE_FIRST + FINE * i - centre) / HWHM;
            k[i] += strength / (1 + d * d);
        }
    }

    /** What the instrument sees of a cell holding the amounts (ppm·m per compound): transmittance on {@link #AXIS}. */
    double[] transmittance(Map<String, Double> ppmMetres) {
        double[] tau = new double[FINE_POINTS];
        ppmMetres.forEach((c, x) -> {
            double[] k = perPpmM.get(c);
            for (int i = 0; i < tau.length; i++) {
                tau[i] += k[i] * x;
            }
        });
        double[] t = new double[FINE_POINTS];
        for (int i = 0; i < t.length; i++) {
            t[i] = Math.pow(10, -tau[i]);
        }
        double sigma = ILS_FWHM / (2 * Math.sqrt(2 * Math.log(2)));
        int half = (int) Math.ceil(4 * sigma / FINE);
        double[] kernel = new double[2 * half + 1];
        double sum = 0;
        for (int j = -half; j <= half; j++) {
            kernel[j + half] = Math.exp(-0.5 * Math.pow(j * FINE / sigma, 2));
            sum += kernel[j + half];
        }
        double[] seen = new double[AXIS.size()];
        for (int p = 0; p < seen.length; p++) {
            int centre = (int) Math.round((AXIS.get(p) - FINE_FIRST) / FINE);
            double v = 0;
            for (int j = -half; j <= half; j++) {
                v += kernel[j + half] * t[centre + j];
            }
            seen[p] = v / sum;
        }
        return seen;
    }

    /** -log10 of {@link #transmittance}, plus a tilted baseline and Gaussian noise (both may be zero). */
    Spectrum absorbance(Map<String, Double> ppmMetres, double offset, double slopePerCm, double noise, Random r) {
        double[] t = transmittance(ppmMetres);
        double[] a = new double[t.length];
        for (int i = 0; i < a.length; i++) {
            a[i] = -Math.log10(t[i]) + offset + slopePerCm * (AXIS.get(i) - 2000)
                    + (noise == 0 ? 0 : noise * r.nextGaussian());
        }
        return new Spectrum(AXIS, a, Ordinate.ABSORBANCE);
    }

    /** A smooth source's single beam, rising and falling over the axis (any positive shape serves). */
    static double[] source() {
        double[] s = new double[AXIS.size()];
        for (int i = 0; i < s.length; i++) {
            double x = (AXIS.get(i) - 2150) / 200;
            s[i] = 5000 * (1 - x * x);
        }
        return s;
    }

    static double[] times(double[] a, double[] b) {
        double[] c = Arrays.copyOf(a, a.length);
        for (int i = 0; i < c.length; i++) {
            c[i] *= b[i];
        }
        return c;
    }
}
