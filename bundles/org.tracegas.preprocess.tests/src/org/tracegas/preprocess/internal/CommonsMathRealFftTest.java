package org.tracegas.preprocess.internal;

import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class CommonsMathRealFftTest {

    @Test
    void matchesNumpyForPowerOfTwo() throws Exception {
        // NumPy 2.4.6 numpy.fft.rfft, n = 64
        NumpyRfftReference.load(64).check(new CommonsMathRealFft(64));
    }

    @Test
    void rejectsLengthThatIsNotPowerOfTwoInsteadOfPadding() {
        // n = 1000 is the NumPy reference length that is not a power of two: padding would change the grid
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> new CommonsMathRealFft(1000));
        assertTrue(e.getMessage().contains("1000"), e.getMessage());
    }

    @Test
    void smallestLengthAgreesWithDirectSum() {
        // n = 2: X0 = x0 + x1, X1 = x0 - x1 (definition of the DFT)
        double[] re = new double[2];
        double[] im = new double[2];
        new CommonsMathRealFft(2).forward(new double[] {3.0, 5.0}, re, im);
        org.junit.jupiter.api.Assertions.assertArrayEquals(new double[] {8.0, -2.0}, re, 0.0);
    }
}
