package org.tracegas.spectrum;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class SpectralAxisTest {

    @Test
    void uniformAxisComputesPointsFromFirstAndStep() {
        SpectralAxis axis = SpectralAxis.uniform(AxisUnit.WAVENUMBER, 600.0, 0.5, 5);
        assertArrayEquals(new double[] { 600.0, 600.5, 601.0, 601.5, 602.0 }, axis.toArray(), 0.0);
        assertEquals(602.0, axis.last(), 0.0);
        assertEquals(3, axis.nearestIndex(601.4));
        assertEquals(4, axis.nearestIndex(9999));
    }

    @Test
    void explicitAxisRejectsANonMonotonicPointAndNamesIt() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> SpectralAxis.of(AxisUnit.WAVENUMBER, 1, 2, 3, 2.5));
        assertTrue(e.getMessage().contains("index 3"), e.getMessage());
    }

    @Test
    void descendingExplicitAxisIsAccepted() {
        SpectralAxis axis = SpectralAxis.of(AxisUnit.MICROMETRE, 5, 4, 3);
        assertFalse(axis.isAscending());
        assertFalse(axis.isUniform());
        assertEquals(1, axis.nearestIndex(4.2));
    }

    @Test
    void zeroStepIsRejected() {
        assertThrows(IllegalArgumentException.class, () -> SpectralAxis.uniform(AxisUnit.WAVENUMBER, 0, 0, 3));
    }
}
