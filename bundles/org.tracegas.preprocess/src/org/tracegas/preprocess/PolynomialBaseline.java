package org.tracegas.preprocess;

import java.util.List;

import org.tracegas.preprocess.internal.LeastSquares;
import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;

/**
 * A polynomial in wavenumber fitted by least squares (QR) to the points of a spectrum that lie in chosen regions
 * (baseline points, free of absorption), and subtracted from the whole spectrum. The wavenumber is mapped to
 * [-1, 1] over the spectrum before fitting, which keeps the design matrix well conditioned.
 */
public final class PolynomialBaseline {

    private final int degree;
    private final List<WavenumberRange> regions;

    /**
     * @param degree  0 .. 10
     * @param regions where the spectrum is baseline; single points are ranges with low == high
     * @throws IllegalArgumentException if the degree is out of range or no region is given
     */
    public PolynomialBaseline(int degree, List<WavenumberRange> regions) {
        if (degree < 0 || degree > 10) {
            throw new IllegalArgumentException("baseline degree must be within 0 .. 10, was " + degree);
        }
        if (regions == null || regions.isEmpty()) {
            throw new IllegalArgumentException("baseline needs at least one region");
        }
        this.degree = degree;
        this.regions = List.copyOf(regions);
    }

    public int degree() {
        return degree;
    }

    public List<WavenumberRange> regions() {
        return regions;
    }

    /**
     * The fitted baseline on the spectrum's axis.
     *
     * @throws IllegalArgumentException if the regions hold fewer finite points than degree + 1
     */
    public double[] fit(Spectrum spectrum) {
        SpectralAxis axis = spectrum.axis();
        int n = axis.size();
        double lo = Math.min(axis.first(), axis.last());
        double hi = Math.max(axis.first(), axis.last());
        double centre = 0.5 * (lo + hi);
        double half = hi > lo ? 0.5 * (hi - lo) : 1.0;
        int count = 0;
        boolean[] used = new boolean[n];
        for (int i = 0; i < n; i++) {
            double s = axis.get(i);
            if (Double.isFinite(spectrum.get(i)) && inRegions(s, axis, i)) {
                used[i] = true;
                count++;
            }
        }
        if (count < degree + 1) {
            throw new IllegalArgumentException("baseline regions " + regions + " hold " + count
                    + " points of the spectrum, a degree " + degree + " polynomial needs " + (degree + 1));
        }
        double[][] design = new double[count][];
        double[] y = new double[count];
        int row = 0;
        for (int i = 0; i < n; i++) {
            if (used[i]) {
                design[row] = powers((axis.get(i) - centre) / half);
                y[row++] = spectrum.get(i);
            }
        }
        double[] c = LeastSquares.solve(design, y);
        double[] baseline = new double[n];
        for (int i = 0; i < n; i++) {
            double t = (axis.get(i) - centre) / half;
            double v = 0;
            for (int k = degree; k >= 0; k--) {
                v = v * t + c[k];
            }
            baseline[i] = v;
        }
        return baseline;
    }

    /** The spectrum minus the fitted baseline, same axis and ordinate. */
    public Spectrum subtract(Spectrum spectrum) {
        double[] baseline = fit(spectrum);
        double[] v = spectrum.toArray();
        for (int i = 0; i < v.length; i++) {
            v[i] -= baseline[i];
        }
        return spectrum.withValues(v, spectrum.ordinate());
    }

    /** A point belongs if a region contains it, or if a single-point region is nearest to it. */
    private boolean inRegions(double s, SpectralAxis axis, int index) {
        for (WavenumberRange r : regions) {
            if (r.contains(s) || (r.low() == r.high() && axis.nearestIndex(r.low()) == index)) {
                return true;
            }
        }
        return false;
    }

    private double[] powers(double t) {
        double[] p = new double[degree + 1];
        p[0] = 1.0;
        for (int k = 1; k <= degree; k++) {
            p[k] = p[k - 1] * t;
        }
        return p;
    }
}
