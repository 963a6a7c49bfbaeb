package org.tracegas.report;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class SpectrumFitTest {

    @Test
    void residualIsMeasuredMinusFitted() {
        SpectrumFit f = new SpectrumFit("t", new double[] {3000, 2999.5, 2999}, new double[] {0.1, 0.2, 0.3},
                new double[] {0.1, 0.25, 0.2});
        assertArrayEquals(new double[] {0, -0.05, 0.1}, f.residual(), 1e-15);
        assertTrue(f.fitPlot().reversedX());
    }

    @Test
    void lengthsMustAgree() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new SpectrumFit("window A", new double[] {1, 2}, new double[] {1, 2}, new double[] {1}));
        assertTrue(e.getMessage().contains("window A"), e.getMessage());
    }

    @Test
    void seriesRejectsNotFiniteValues() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new Series("CO", new double[] {1, 2}, new double[] {1, Double.NaN}));
        assertTrue(e.getMessage().contains("y of CO value 1"), e.getMessage());
    }
}
