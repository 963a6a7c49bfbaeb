package org.tracegas.quantify.internal;

/**
 * Values of uniformly sampled, band-limited data between its samples, by the Whittaker-Shannon (sinc) interpolant
 * truncated to +/- {@link #HALF_WIDTH} samples under a Blackman taper and normalised so that a constant stays
 * exact. A spectrum measured by FTIR is band-limited by its sampling, so this recovers it between samples where
 * linear interpolation cuts the top off lines two or three points wide (a peak midway between samples loses
 * about 12 % of its height when the line's standard deviation is one sample). Points nearer to an end than the half
 * width see a shortened interpolant and lose accuracy.
 */
public final class BandLimitedResampler {

    /** Samples on each side of the interpolant. */
    public static final int HALF_WIDTH = 32;

    private final double first;
    private final double step;
    private final double[] values;

    /**
     * @param first  wavenumber of the first sample
     * @param step   step between samples, positive or negative, not zero
     * @param values the samples
     */
    public BandLimitedResampler(double first, double step, double[] values) {
        if (!(Math.abs(step) > 0 && Double.isFinite(step) && Double.isFinite(first))) {
            throw new IllegalArgumentException("step must be finite and not zero and first finite, were " + step
                    + " and " + first);
        }
        if (values.length < 2) {
            throw new IllegalArgumentException("resampling needs at least 2 samples, had " + values.length);
        }
        this.first = first;
        this.step = step;
        this.values = values.clone();
    }

    /** Whether the samples extend to the wavenumber. */
    public boolean covers(double wavenumber) {
        double x = (wavenumber - first) / step;
        return x >= -1e-9 && x <= values.length - 1 + 1e-9;
    }

    /** The interpolated value; the caller checks {@link #covers(double)} first. */
    public double at(double wavenumber) {
        double x = (wavenumber - first) / step;
        long nearest = Math.round(x);
        double offset = x - nearest;
        if (Math.abs(offset) < 1e-9) {
            // on a sample: the interpolant passes through it
            return values[(int) Math.max(0, Math.min(values.length - 1, nearest))];
        }
        int lo = (int) Math.max(0, Math.floor(x) - HALF_WIDTH + 1);
        int hi = (int) Math.min(values.length - 1, Math.floor(x) + HALF_WIDTH);
        double sinPi = Math.sin(Math.PI * (x - Math.floor(x)));
        double sum = 0;
        double norm = 0;
        for (int m = lo; m <= hi; m++) {
            double d = x - m;
            // sin(pi d) alternates in sign from sample to sample: (-1)^(floor(x) - m) sin(pi frac(x))
            double sign = ((long) Math.floor(x) - m) % 2 == 0 ? 1 : -1;
            double t = Math.PI * d / (HALF_WIDTH + 1);
            double taper = 0.42 + 0.5 * Math.cos(t) + 0.08 * Math.cos(2 * t);
            double kernel = sign * sinPi / (Math.PI * d) * taper;
            sum += kernel * values[m];
            norm += kernel;
        }
        return sum / norm;
    }
}
