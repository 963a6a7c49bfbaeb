package org.tracegas.preprocess.internal;

import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

class JTransformsRealFftTest {

    @Test
    void matchesNumpyForPowerOfTwo() throws Exception {
        // NumPy 2.4.6 numpy.fft.rfft, n = 64
        NumpyRfftReference.load(64).check(new JTransformsRealFft(64));
    }

    @Test
    void matchesNumpyForLengthThatIsNotPowerOfTwo() throws Exception {
        // NumPy 2.4.6 numpy.fft.rfft, n = 1000
        NumpyRfftReference.load(1000).check(new JTransformsRealFft(1000));
    }

    @Test
    void rejectsOddLength() {
        assertThrows(IllegalArgumentException.class, () -> new JTransformsRealFft(999));
    }
}
