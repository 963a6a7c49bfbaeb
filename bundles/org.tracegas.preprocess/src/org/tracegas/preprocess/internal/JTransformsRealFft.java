package org.tracegas.preprocess.internal;

import org.jtransforms.fft.DoubleFFT_1D;
import org.tracegas.preprocess.RealFft;

/** {@link RealFft} on JTransforms' in-place real transform. */
public final class JTransformsRealFft implements RealFft {

    private final int n;
    private final DoubleFFT_1D plan;
    private final double[] work;

    public JTransformsRealFft(int size) {
        RealFftChecks.requireEvenSize(size);
        this.n = size;
        this.plan = new DoubleFFT_1D(size);
        this.work = new double[size];
    }

    @Override
    public int size() {
        return n;
    }

    @Override
    public void forward(double[] input, double[] re, double[] im) {
        RealFftChecks.requireArrays(n, input, re, im);
        System.arraycopy(input, 0, work, 0, n);
        plan.realForward(work);
        // packed layout: work[0] = Re X0, work[1] = Re X(n/2), then (Re, Im) pairs
        int half = n / 2;
        re[0] = work[0];
        im[0] = 0.0;
        re[half] = work[1];
        im[half] = 0.0;
        for (int k = 1; k < half; k++) {
            re[k] = work[2 * k];
            im[k] = work[2 * k + 1];
        }
    }

    @Override
    public void inverse(double[] re, double[] im, double[] output) {
        RealFftChecks.requireArrays(n, output, re, im);
        int half = n / 2;
        output[0] = re[0];
        output[1] = re[half];
        for (int k = 1; k < half; k++) {
            output[2 * k] = re[k];
            output[2 * k + 1] = im[k];
        }
        plan.realInverse(output, true);
    }
}
