package org.tracegas.quantify.internal;

/**
 * Absorptivity (absorbance per ppm·m) of one compound from references at one or several amounts, with its first
 * and second derivative in wavenumber. The absorptivity used in a fit is a mix of the references: pooled for a
 * linear fit, interpolated between the bracketing references for a non-linear one.
 */
public final class Absorptivity {

    private final String compound;
    private final double[] amounts; // ascending ppm·m
    private final Resampler[] value;
    private final Resampler[] slope;
    private final Resampler[] curvature;

    /**
     * @param compound   compound name, for messages
     * @param amounts    ppm·m of each reference, strictly ascending
     * @param axes       wavenumber axis of each reference
     * @param absorbance absorbance of each reference
     */
    public Absorptivity(String compound, double[] amounts, double[][] axes, double[][] absorbance) {
        this.compound = compound;
        this.amounts = amounts.clone();
        int n = amounts.length;
        this.value = new Resampler[n];
        this.slope = new Resampler[n];
        this.curvature = new Resampler[n];
        for (int i = 0; i < n; i++) {
            if (i > 0 && !(amounts[i] > amounts[i - 1])) {
                throw new IllegalArgumentException("amounts of " + compound + " must ascend strictly");
            }
            double[] k = new double[absorbance[i].length];
            for (int j = 0; j < k.length; j++) {
                k[j] = absorbance[i][j] / amounts[i];
            }
            value[i] = new Resampler(axes[i], k);
            slope[i] = new Resampler(axes[i], derivative(axes[i], k, 1));
            curvature[i] = new Resampler(axes[i], derivative(axes[i], k, 2));
        }
    }

    private static double[] derivative(double[] axis, double[] k, int order) {
        double step = axis[1] - axis[0];
        for (int i = 2; i < axis.length; i++) {
            if (Math.abs(axis[i] - axis[i - 1] - step) > 1e-9 * Math.abs(step)) {
                return Resampler.derivative(axis, k, order);
            }
        }
        return BandLimitedDerivative.of(k, step, order);
    }

    public String compound() {
        return compound;
    }

    public int references() {
        return amounts.length;
    }

    public double lowestAmount() {
        return amounts[0];
    }

    public double highestAmount() {
        return amounts[amounts.length - 1];
    }

    /** Whether reference i extends to the wavenumber. */
    public boolean covers(int i, double wavenumber) {
        return value[i].covers(wavenumber);
    }

    public double amount(int i) {
        return amounts[i];
    }

    /** Absorptivity of reference i at a wavenumber: order 0 value, 1 slope, 2 curvature. */
    public double at(int i, int order, double wavenumber) {
        return switch (order) {
            case 0 -> value[i].at(wavenumber);
            case 1 -> slope[i].at(wavenumber);
            case 2 -> curvature[i].at(wavenumber);
            default -> throw new IllegalArgumentException("order must be 0, 1 or 2, was " + order);
        };
    }

    /**
     * Mix for a linear fit: the least-squares absorptivity through the origin over all references,
     * sum(a_i A_i) / sum(a_i^2) = sum(a_i^2 k_i) / sum(a_i^2).
     */
    public double[] pooledMix() {
        double sum = 0;
        for (double a : amounts) {
            sum += a * a;
        }
        double[] mix = new double[amounts.length];
        for (int i = 0; i < mix.length; i++) {
            mix[i] = amounts[i] * amounts[i] / sum;
        }
        return mix;
    }

    /**
     * Mix for the effective absorptivity at an estimated amount: piecewise linear in the amount between the
     * bracketing references, the lowest reference below it and the highest above it.
     */
    public double[] effectiveMix(double amount) {
        int n = amounts.length;
        double[] mix = new double[n];
        if (amount <= amounts[0]) {
            mix[0] = 1;
        } else if (amount >= amounts[n - 1]) {
            mix[n - 1] = 1;
        } else {
            int hi = 1;
            while (amounts[hi] < amount) {
                hi++;
            }
            double t = (amount - amounts[hi - 1]) / (amounts[hi] - amounts[hi - 1]);
            mix[hi - 1] = 1 - t;
            mix[hi] = t;
        }
        return mix;
    }
}
