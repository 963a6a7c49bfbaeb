package org.tracegas.preprocess.internal;

/** Argument checks shared by the {@link org.tracegas.preprocess.RealFft} implementations. */
final class RealFftChecks {

    private RealFftChecks() {
    }

    static void requireEvenSize(int size) {
        if (size < 2 || size % 2 != 0) {
            throw new IllegalArgumentException("transform size must be even and at least 2, was " + size);
        }
    }

    static void requireArrays(int n, double[] real, double[] re, double[] im) {
        if (real == null || real.length < n) {
            throw new IllegalArgumentException("real data array must hold " + n + " values, has "
                    + (real == null ? "none" : real.length));
        }
        int half = n / 2 + 1;
        if (re == null || re.length < half || im == null || im.length < half) {
            throw new IllegalArgumentException("re and im arrays must hold " + half + " values each");
        }
    }
}
