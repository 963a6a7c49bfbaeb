package org.tracegas.quantify.linelist.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;
import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.SpectralAxis;

class CubicReaderTest {

    private static final SpectralAxis GRID = SpectralAxis.uniform(AxisUnit.WAVENUMBER, 2000, 0.02, 101);

    private static double[] sampled(java.util.function.DoubleUnaryOperator f) {
        double[] v = new double[GRID.size()];
        for (int i = 0; i < v.length; i++) {
            v[i] = f.applyAsDouble(GRID.get(i));
        }
        return v;
    }

    /**
     * A quadratic is read exactly, value and slope: central differences give a quadratic's exact slope, and the
     * cubic Hermite curve through exact values and slopes is the quadratic itself (calculus).
     */
    @Test
    void readsAQuadraticExactly() {
        double[] v = sampled(x -> 3 - 0.5 * (x - 2001) + 7 * (x - 2001) * (x - 2001));
        double[] out = new double[2];
        for (double x : new double[] {2000.03, 2000.5, 2001.0, 2001.377}) {
            new CubicReader(GRID).read(v, x, out);
            double d = x - 2001;
            assertEquals(3 - 0.5 * d + 7 * d * d, out[0], 1e-11);
            assertEquals(-0.5 + 14 * d, out[1], 1e-8);
        }
    }

    @Test
    void refusesToReadBeyondTheGrid() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new CubicReader(GRID).read(new double[GRID.size()], 2001.99, new double[2]));
        assertEquals("wavenumber 2001.99 lies outside the model's fine grid", e.getMessage());
    }
}
