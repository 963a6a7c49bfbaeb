package org.tracegas.library.synthesis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class PartitionFunctionTest {

    @Test
    void tableInterpolatesLinearlyAndHitsItsNodes() {
        TabulatedPartitionFunction q = new TabulatedPartitionFunction(new double[] {200, 300, 400},
                new double[] {70, 107, 145});
        assertEquals(107, q.value(300), 0);
        assertEquals(88.5, q.value(250), 1e-12);
        assertEquals(107.0 / 145.0, q.ratio(300, 400), 1e-15);
    }

    @Test
    void tableRejectsTemperaturesOutsideItsRange() {
        TabulatedPartitionFunction q = new TabulatedPartitionFunction(new double[] {200, 300}, new double[] {1, 2});
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> q.value(350));
        assertTrue(e.getMessage().contains("350"), e.getMessage());
        assertThrows(IllegalArgumentException.class,
                () -> new TabulatedPartitionFunction(new double[] {300, 200}, new double[] {1, 2}));
    }

    /** Rigid rotor: Q proportional to T for linear molecules, T^1.5 for non-linear ones (any spectroscopy text). */
    @Test
    void powerLawRatios() {
        assertEquals(296.0 / 350.0, PowerLawPartitionFunction.linearMolecule().ratio(296, 350), 1e-15);
        assertEquals(Math.pow(296.0 / 350.0, 1.5), PowerLawPartitionFunction.nonLinearMolecule().ratio(296, 350),
                1e-15);
    }
}
