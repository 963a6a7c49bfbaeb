package org.tracegas.preprocess.internal;

import org.jtransforms.fft.DoubleFFT_1D;
import org.tracegas.preprocess.RealFft;

import pl.edu.icm.jlargearrays.ConcurrencyUtils;

/**
 * {@link RealFft} on JTransforms' in-place real transform, each transform on the thread that asks for it.
 */
public final class JTransformsRealFft implements RealFft {

    static {
        // The batch already keeps every core busy with whole spectra, so splitting one transform over threads
        // only adds hand-overs; and JTransforms' shared pool starts non-daemon threads, which kept a JVM whose
        // work was done alive until they idled out.
        ConcurrencyUtils.setNumberOfThreads(1);
    }

    private final int n;
    private final DoubleFFT_1D plan;

    public JTransformsRealFft(int size) {
        RealFftChecks.requireEvenSize(size);
        this.n = size;
        this.plan = new DoubleFFT_1D(size);
    }

    @Override
    public int size() {
        return n;
    }

    @Override
    public void forward(double[] input, double[] re, double[] im) {
        RealFftChecks.requireArrays(n, input, re, im);
        plan.realForward(input);
        // packed layout in place: input[0] = Re X0, input[1] = Re X(n/2), then (Re, Im) pairs
        int half = n / 2;
        re[0] = input[0];
        im[0] = 0.0;
        re[half] = input[1];
        im[half] = 0.0;
        for (int k = 1; k < half; k++) {
            re[k] = input[2 * k];
            im[k] = input[2 * k + 1];
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
