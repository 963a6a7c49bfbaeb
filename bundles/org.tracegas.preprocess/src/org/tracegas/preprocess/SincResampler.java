package org.tracegas.preprocess;

import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;

/**
 * Band-limited interpolation of a uniformly sampled spectrum onto another axis of the same unit: a sinc kernel
 * tapered by a Blackman window over a given number of source points on each side. The weights are divided by
 * their sum, so that a constant stays exactly constant, also near the ends where the kernel is cut. Target points
 * outside the source axis get NaN.
 */
public final class SincResampler {

    /** Source points on each side of a target point (common practice, no source). */
    public static final int DEFAULT_HALF_WIDTH = 16;

    private final int halfWidth;

    public SincResampler() {
        this(DEFAULT_HALF_WIDTH);
    }

    /** @throws IllegalArgumentException if the half width is outside 2 .. 256 */
    public SincResampler(int halfWidth) {
        if (halfWidth < 2 || halfWidth > 256) {
            throw new IllegalArgumentException("resampling halfWidth must be within 2 .. 256, was " + halfWidth);
        }
        this.halfWidth = halfWidth;
    }

    public int halfWidth() {
        return halfWidth;
    }

    /**
     * @throws IllegalArgumentException if an argument is null, the source axis is not uniform or the units differ
     */
    public Spectrum resample(Spectrum source, SpectralAxis target) {
        if (source == null || target == null) {
            throw new IllegalArgumentException("source spectrum and target axis must not be null");
        }
        SpectralAxis axis = source.axis();
        if (!axis.isUniform()) {
            throw new IllegalArgumentException("source spectrum axis must be uniform, was " + axis);
        }
        if (axis.unit() != target.unit()) {
            throw new IllegalArgumentException("target axis unit " + target.unit() + " differs from source unit "
                    + axis.unit());
        }
        int n = axis.size();
        double first = axis.first();
        double step = axis.step();
        double[] out = new double[target.size()];
        for (int t = 0; t < out.length; t++) {
            double u = (target.get(t) - first) / step;
            if (!(u >= -1e-9 && u <= n - 1 + 1e-9)) {
                out[t] = Double.NaN;
                continue;
            }
            int centre = (int) Math.round(u);
            if (Math.abs(u - centre) < 1e-12) {
                out[t] = source.get(centre);
                continue;
            }
            int from = Math.max(0, (int) Math.floor(u) - halfWidth + 1);
            int to = Math.min(n - 1, (int) Math.floor(u) + halfWidth);
            double sum = 0.0;
            double weights = 0.0;
            for (int j = from; j <= to; j++) {
                double w = kernel(u - j);
                sum += w * source.get(j);
                weights += w;
            }
            out[t] = sum / weights;
        }
        return new Spectrum(target, out, source.ordinate());
    }

    private double kernel(double d) {
        double a = Math.abs(d);
        if (a >= halfWidth) {
            return 0.0;
        }
        double x = Math.PI * d;
        double sinc = Math.sin(x) / x;
        double r = Math.PI * a / halfWidth;
        return sinc * (0.42 + 0.5 * Math.cos(r) + 0.08 * Math.cos(2 * r));
    }
}
