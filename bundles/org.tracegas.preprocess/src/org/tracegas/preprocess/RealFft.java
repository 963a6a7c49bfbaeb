package org.tracegas.preprocess;

/**
 * Discrete Fourier transform of real data of a fixed even length n: X[k] = sum x[j] exp(-2 pi i k j / n),
 * k = 0 .. n/2 (the other half follows by Hermitian symmetry). Instances hold work buffers and are not thread
 * safe: use one per thread.
 */
public interface RealFft {

    /** The transform length n. */
    int size();

    /**
     * Forward transform.
     *
     * @param input n real values; overwritten (used as work space, which saves a copy)
     * @param re    receives Re X[k], k = 0 .. n/2 (length at least n/2 + 1)
     * @param im    receives Im X[k], k = 0 .. n/2 (length at least n/2 + 1)
     */
    void forward(double[] input, double[] re, double[] im);

    /**
     * Inverse of {@link #forward}, including the factor 1/n: x[j] = (1/n) sum X[k] exp(2 pi i k j / n) over all
     * k, with the upper half taken as the complex conjugate of the lower one.
     *
     * @param re     Re X[k], k = 0 .. n/2, not modified
     * @param im     Im X[k], k = 0 .. n/2, not modified; Im X[0] and Im X[n/2] are ignored
     * @param output receives the n real values
     */
    void inverse(double[] re, double[] im, double[] output);
}
