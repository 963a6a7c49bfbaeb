package org.tracegas.preprocess.internal;

import org.apache.commons.math3.transform.DftNormalization;
import org.apache.commons.math3.transform.FastFourierTransformer;
import org.apache.commons.math3.transform.TransformType;
import org.tracegas.preprocess.RealFft;

/**
 * {@link RealFft} on Commons Math's in-place radix-2 complex transform: the n real values are taken as n/2
 * complex ones (even samples real, odd samples imaginary), transformed, and split into the spectrum of the real
 * sequence. Commons Math accepts powers of two only; other lengths are rejected rather than padded, because
 * padding would change the frequency grid.
 */
public final class CommonsMathRealFft implements RealFft {

    private final int n;
    private final int m;
    private final double[][] z;
    private final double[] cos;
    private final double[] sin;

    public CommonsMathRealFft(int size) {
        RealFftChecks.requireEvenSize(size);
        if (Integer.bitCount(size) != 1) {
            throw new IllegalArgumentException("transform size must be a power of two for Commons Math, was " + size);
        }
        this.n = size;
        this.m = size / 2;
        this.z = new double[2][m];
        this.cos = new double[m + 1];
        this.sin = new double[m + 1];
        for (int k = 0; k <= m; k++) {
            double angle = 2.0 * Math.PI * k / n;
            cos[k] = Math.cos(angle);
            sin[k] = Math.sin(angle);
        }
    }

    @Override
    public int size() {
        return n;
    }

    @Override
    public void forward(double[] input, double[] re, double[] im) {
        RealFftChecks.requireArrays(n, input, re, im);
        double[] zr = z[0];
        double[] zi = z[1];
        for (int j = 0; j < m; j++) {
            zr[j] = input[2 * j];
            zi[j] = input[2 * j + 1];
        }
        if (m > 1) {
            FastFourierTransformer.transformInPlace(z, DftNormalization.STANDARD, TransformType.FORWARD);
        }
        for (int k = 0; k <= m; k++) {
            int a = k % m;
            int b = (m - k) % m;
            // E = (Z[k] + conj Z[m-k]) / 2, O = (Z[k] - conj Z[m-k]) / 2i, X = E + exp(-2 pi i k/n) O
            double er = 0.5 * (zr[a] + zr[b]);
            double ei = 0.5 * (zi[a] - zi[b]);
            double or = 0.5 * (zi[a] + zi[b]);
            double oi = -0.5 * (zr[a] - zr[b]);
            re[k] = er + cos[k] * or + sin[k] * oi;
            im[k] = ei + cos[k] * oi - sin[k] * or;
        }
        im[0] = 0.0;
        im[m] = 0.0;
    }

    @Override
    public void inverse(double[] re, double[] im, double[] output) {
        RealFftChecks.requireArrays(n, output, re, im);
        double[] zr = z[0];
        double[] zi = z[1];
        for (int k = 0; k < m; k++) {
            double ar = re[k];
            double ai = k == 0 ? 0.0 : im[k];
            double br = re[m - k];
            double bi = k == 0 ? 0.0 : -im[m - k]; // conjugate of X[m-k]; Im X[n/2] is ignored
            // E = (X[k] + conj X[m-k]) / 2, O = (X[k] - conj X[m-k]) exp(2 pi i k/n) / 2, Z = E + i O
            double er = 0.5 * (ar + br);
            double ei = 0.5 * (ai + bi);
            double dr = 0.5 * (ar - br);
            double di = 0.5 * (ai - bi);
            double or = dr * cos[k] - di * sin[k];
            double oi = dr * sin[k] + di * cos[k];
            zr[k] = er - oi;
            zi[k] = ei + or;
        }
        if (m > 1) {
            FastFourierTransformer.transformInPlace(z, DftNormalization.STANDARD, TransformType.INVERSE);
        }
        for (int j = 0; j < m; j++) {
            output[2 * j] = zr[j];
            output[2 * j + 1] = zi[j];
        }
    }
}
