package org.tracegas.spectrum.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.tracegas.spectrum.Interferogram;

class HandedOverSamplesTest {

    /** HeNe reference laser, 15798 cm-1 (common practice, no source). */
    private static final double HE_NE = 15798.0;

    /**
     * The handed-over array is the interferogram's own, not a copy (a write after the hand-over shows, which is why
     * only callers that drop the array may use it); the public constructor still copies.
     */
    @Test
    void keepsTheArrayItselfWhereThePublicConstructorCopies() {
        double[] handed = {0.5, -0.25, 1.0};
        Interferogram own = HandedOverSamples.interferogram(handed, HE_NE, 2);
        double[] lent = {0.5, -0.25, 1.0};
        Interferogram copied = new Interferogram(lent, HE_NE, 2);
        handed[1] = 7;
        lent[1] = 7;
        assertEquals(7, own.get(1), 0);
        assertEquals(-0.25, copied.get(1), 0);
        assertEquals(3, own.size());
        assertEquals(HE_NE, own.laserWavenumber(), 0);
        assertEquals(2, own.samplingInterval());
        // Nyquist: half the sampling rate in wavenumbers, laser / (2 x interval) (common practice, no source)
        assertEquals(HE_NE / 4, own.nyquistWavenumber(), 1e-9);
    }

    /** The same checks as the public constructor: a bad sample is named by its index. */
    @Test
    void checksLikeThePublicConstructor() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> HandedOverSamples.interferogram(new double[] {1, Double.NaN, 2}, HE_NE, 1));
        assertTrue(e.getMessage().contains("sample 1"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> HandedOverSamples.interferogram(new double[] {1}, HE_NE, 1));
        assertThrows(IllegalArgumentException.class,
                () -> HandedOverSamples.interferogram(new double[] {1, 2}, HE_NE, 0));
        assertThrows(IllegalArgumentException.class,
                () -> HandedOverSamples.interferogram(new double[] {1, 2}, Double.POSITIVE_INFINITY, 1));
    }

    /** The maker is granted once, by the interferogram class itself. */
    @Test
    void refusesASecondMaker() {
        new Interferogram(new double[] {1, 2}, HE_NE, 1);
        assertThrows(IllegalStateException.class,
                () -> HandedOverSamples.grant((samples, laser, interval) -> null));
    }
}
