package org.tracegas.preprocess;

import org.tracegas.preprocess.internal.CommonsMathRealFft;
import org.tracegas.preprocess.internal.JTransformsRealFft;

/** The available implementations of {@link RealFft}. */
public enum FftEngine {
    /** JTransforms 3.1 (split-radix for powers of two, mixed radix and Bluestein otherwise): any even length. */
    JTRANSFORMS {
        @Override
        public RealFft create(int size) {
            return new JTransformsRealFft(size);
        }
    },
    /** Commons Math 3.6.1 radix-2 transform of half length with the real-input split: powers of two only. */
    COMMONS_MATH {
        @Override
        public RealFft create(int size) {
            return new CommonsMathRealFft(size);
        }
    };

    /**
     * A new transform of the given length.
     *
     * @throws IllegalArgumentException if the length is odd or below 2, or (Commons Math) not a power of two
     */
    public abstract RealFft create(int size);

    /**
     * The engine used unless one is chosen: JTransforms. In the JMH comparison of both engines in one run
     * (PreprocessFftBenchmark, 2^15 points, one thread) its real transform took 2.4 to 9 times less time than the
     * Commons Math path (a plain radix-2 complex transform without split-radix or cache-friendly ordering), and it
     * accepts any length, while the other engine needs powers of two.
     */
    public static FftEngine defaultEngine() {
        return JTRANSFORMS;
    }
}
