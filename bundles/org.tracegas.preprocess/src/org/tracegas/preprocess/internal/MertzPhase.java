package org.tracegas.preprocess.internal;

import org.tracegas.preprocess.Apodization;
import org.tracegas.preprocess.FftEngine;
import org.tracegas.preprocess.RealFft;

/**
 * Mertz phase correction: the phase of a short, triangularly apodized double-sided part around ZPD, computed at
 * low resolution and interpolated (as unit complex numbers, so that no phase unwrapping is needed) onto the
 * full-resolution grid. Holds work buffers: one instance per thread.
 */
public final class MertzPhase {

    private final FftEngine engine;
    private RealFft fft;
    private double[] work;
    private double[] cos;
    private double[] sin;

    public MertzPhase(FftEngine engine) {
        this.engine = engine;
    }

    /**
     * Measures the phase.
     *
     * @param x         interferogram
     * @param dc        its DC level, taken off
     * @param zpd       ZPD sample
     * @param direction +1 if the long side follows ZPD, -1 if it precedes it
     * @param half      points taken on each side of ZPD (at least 1, and available on both sides)
     */
    public void measure(double[] x, double dc, int zpd, int direction, int half) {
        int size = Integer.highestOneBit(2 * half - 1) << 1;
        if (fft == null || fft.size() != size) {
            fft = engine.create(size);
            work = new double[size];
            cos = new double[size / 2 + 1];
            sin = new double[size / 2 + 1];
        }
        java.util.Arrays.fill(work, 0.0);
        for (int j = 1 - half; j < half; j++) {
            double w = Apodization.TRIANGULAR.weight((double) j / half);
            work[j < 0 ? size + j : j] = w * (x[zpd + direction * j] - dc);
        }
        fft.forward(work, cos, sin);
        for (int k = 0; k < cos.length; k++) {
            double norm = Math.sqrt(cos[k] * cos[k] + sin[k] * sin[k]);
            if (norm > 0) {
                cos[k] /= norm;
                sin[k] /= norm;
            } else {
                cos[k] = 1.0;
                sin[k] = 0.0;
            }
        }
    }

    /**
     * Removes the measured phase from bins kLow .. kLow + out.length - 1 of a spectrum of transform length
     * {@code size}: out = Re(X exp(-i phase)).
     */
    public void correct(double[] re, double[] im, int size, int kLow, double[] out) {
        int phaseSize = fft.size();
        int last = phaseSize / 2;
        double scale = (double) phaseSize / size;
        for (int i = 0; i < out.length; i++) {
            int k = kLow + i;
            double u = k * scale;
            int i0 = (int) u;
            double f = u - i0;
            int i1 = Math.min(i0 + 1, last);
            double c = cos[i0] + f * (cos[i1] - cos[i0]);
            double s = sin[i0] + f * (sin[i1] - sin[i0]);
            double norm = Math.sqrt(c * c + s * s);
            out[i] = norm > 0 ? (re[k] * c + im[k] * s) / norm : Math.sqrt(re[k] * re[k] + im[k] * im[k]);
        }
    }
}
