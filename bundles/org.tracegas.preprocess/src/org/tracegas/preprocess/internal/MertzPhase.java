package org.tracegas.preprocess.internal;

import org.tracegas.preprocess.Apodization;
import org.tracegas.preprocess.FftEngine;
import org.tracegas.preprocess.RealFft;
import org.tracegas.spectrum.Interferogram;

/**
 * Mertz phase correction: the phase of a short, triangularly apodized double-sided part around ZPD, computed at
 * low resolution and interpolated onto the full-resolution grid by the turn between neighbouring low-resolution
 * points (which lies within +-pi, so no phase unwrapping is needed). Holds work buffers: one instance per thread.
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
    public void measure(Interferogram x, double dc, int zpd, int direction, int half) {
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
            work[j < 0 ? size + j : j] = w * (x.get(zpd + direction * j) - dc);
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
     * {@code size}: out = Re(X exp(-i phase)). Between two low-resolution bins the phase is interpolated linearly
     * in angle, by turning a unit vector through equal steps (a complex product per bin, no square root or
     * division); each interval starts again from the measured values, so rounding does not build up.
     */
    public void correct(double[] re, double[] im, int size, int kLow, double[] out) {
        int ratio = size / fft.size(); // main bins per low-resolution bin (both lengths are powers of two)
        int kEnd = kLow + out.length;
        int k = kLow;
        while (k < kEnd) {
            int i0 = k / ratio;
            int i1 = Math.min(i0 + 1, cos.length - 1);
            int stop = Math.min(kEnd, (i0 + 1) * ratio);
            // turn from phase i0 to phase i1 over `ratio` bins
            double turn = Math.atan2(sin[i1] * cos[i0] - cos[i1] * sin[i0], cos[i1] * cos[i0] + sin[i1] * sin[i0]);
            double step = turn / ratio;
            double stepCos = Math.cos(step);
            double stepSin = Math.sin(step);
            double start = step * (k - i0 * ratio);
            double c = cos[i0] * Math.cos(start) - sin[i0] * Math.sin(start);
            double s = cos[i0] * Math.sin(start) + sin[i0] * Math.cos(start);
            for (; k < stop; k++) {
                out[k - kLow] = re[k] * c + im[k] * s;
                double next = c * stepCos - s * stepSin;
                s = c * stepSin + s * stepCos;
                c = next;
            }
        }
    }
}
