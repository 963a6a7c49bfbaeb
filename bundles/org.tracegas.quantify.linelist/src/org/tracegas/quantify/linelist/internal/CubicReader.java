package org.tracegas.quantify.linelist.internal;

import org.tracegas.spectrum.SpectralAxis;

/**
 * Reads values given on a uniform grid between its points by the cubic of Catmull and Rom (a cubic Hermite
 * curve whose slopes are the central differences): continuous value and slope, and exact for quadratics. On the
 * fine grid of a {@link MixtureModel} (an eighth of the resolution or finer) its error is far below the noise.
 */
final class CubicReader {

    private final double first;
    private final double step;
    private final int size;

    CubicReader(SpectralAxis grid) {
        this.first = grid.first();
        this.step = grid.step();
        this.size = grid.size();
    }

    /**
     * @param values values on the grid
     * @param x      where to read, at least one step inside each end of the grid
     * @param out    receives the value and the slope d value / dx
     */
    void read(double[] values, double x, double[] out) {
        double at = (x - first) / step;
        int i = (int) Math.floor(at);
        if (i < 1 || i > size - 3) {
            throw new IllegalArgumentException("wavenumber " + x + " lies outside the model's fine grid");
        }
        double t = at - i;
        double p0 = values[i - 1];
        double p1 = values[i];
        double p2 = values[i + 1];
        double p3 = values[i + 2];
        double a = -p0 + p2;
        double b = 2 * p0 - 5 * p1 + 4 * p2 - p3;
        double c = -p0 + 3 * p1 - 3 * p2 + p3;
        out[0] = 0.5 * (2 * p1 + t * (a + t * (b + t * c)));
        out[1] = 0.5 * (a + t * (2 * b + t * 3 * c)) / step;
    }
}
