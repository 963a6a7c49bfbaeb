package org.tracegas.quantify.internal;

import java.util.Arrays;
import java.util.List;

import org.tracegas.quantify.AnalysisRegion;

/**
 * The sample axis points of one fit, region by region, with their weights and the baseline polynomial of each
 * region evaluated on them. Shared by every fit algorithm, so that all of them see the same points and baselines.
 */
public final class FitPoints {

    private final int[] rows;          // sample axis indices, region by region
    private final int[] regionStart;   // index into rows where each region starts; last entry = rows.length
    private final double[] weights;    // per row, or null
    private final double[][] baseline; // [term][row]

    /**
     * @param label       names the fit in messages, for example "fit of CO"
     * @param regions     the regions
     * @param wavenumbers the sample axis
     * @param axisWeights weight per sample axis point, or null
     * @throws IllegalArgumentException if a region holds too few axis points or the weights do not cover a point
     */
    public FitPoints(String label, List<AnalysisRegion> regions, double[] wavenumbers, double[] axisWeights) {
        int nr = regions.size();
        this.regionStart = new int[nr + 1];
        int[] buffer = new int[wavenumbers.length * nr];
        int count = 0;
        int terms = 0;
        for (int r = 0; r < nr; r++) {
            regionStart[r] = count;
            AnalysisRegion region = regions.get(r);
            for (int i = 0; i < wavenumbers.length; i++) {
                if (region.contains(wavenumbers[i])) {
                    buffer[count++] = i;
                }
            }
            if (count - regionStart[r] <= region.baselineOrder() + 1) {
                throw new IllegalArgumentException(label + ": region " + r + " (" + region.windows()
                        + ") holds " + (count - regionStart[r]) + " sample axis points, too few for its baseline");
            }
            terms += region.baselineOrder() + 1;
        }
        regionStart[nr] = count;
        this.rows = Arrays.copyOf(buffer, count);
        this.weights = axisWeights == null ? null : gather(axisWeights);
        if (weights != null) {
            for (int j = 0; j < count; j++) {
                if (!(weights[j] > 0 && Double.isFinite(weights[j]))) {
                    throw new IllegalArgumentException(label + ": weights do not extend to "
                            + wavenumbers[rows[j]] + " cm-1");
                }
            }
        }
        this.baseline = new double[terms][count];
        int t = 0;
        for (int r = 0; r < nr; r++) {
            AnalysisRegion region = regions.get(r);
            double mid = (region.low() + region.high()) / 2;
            double half = (region.high() - region.low()) / 2;
            for (int o = 0; o <= region.baselineOrder(); o++, t++) {
                for (int j = regionStart[r]; j < regionStart[r + 1]; j++) {
                    // wavenumber mapped onto [-1, 1] over the region keeps the powers comparable in size
                    baseline[t][j] = Math.pow((wavenumbers[rows[j]] - mid) / half, o);
                }
            }
        }
    }

    /** The values at the fit points of a vector given on the full sample axis. */
    public double[] gather(double[] full) {
        double[] out = new double[rows.length];
        for (int j = 0; j < rows.length; j++) {
            out[j] = full[rows[j]];
        }
        return out;
    }

    /** Number of fit points. */
    public int size() {
        return rows.length;
    }

    /** Sample axis index of fit point j. */
    public int row(int j) {
        return rows[j];
    }

    /** Sample axis indices of the fit points, region by region. */
    public int[] rows() {
        return rows.clone();
    }

    public int regions() {
        return regionStart.length - 1;
    }

    public int regionStart(int region) {
        return regionStart[region];
    }

    /** Weight per fit point, or null for equal weights; not to be written. */
    public double[] weightsUnsafe() {
        return weights;
    }

    /** Number of baseline terms over all regions. */
    public int baselineTerms() {
        return baseline.length;
    }

    /** Baseline columns [term][point]; not to be written. */
    public double[][] baselineUnsafe() {
        return baseline;
    }
}
