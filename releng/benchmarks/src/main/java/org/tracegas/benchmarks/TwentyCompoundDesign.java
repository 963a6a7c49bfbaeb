package org.tracegas.benchmarks;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;

import org.tracegas.quantify.AnalysisRegion;
import org.tracegas.quantify.Analyte;
import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.SpectralAxis;

/**
 * The design the fit benchmarks share: 20 compounds of 60 Lorentz lines each at random places over 4,000 points,
 * every compound an analyte fitted with the other 19 in 3 regions with linear baselines.
 */
final class TwentyCompoundDesign {

    static final int COMPOUNDS = 20;
    static final int POINTS = 4000;
    static final SpectralAxis AXIS = SpectralAxis.uniform(AxisUnit.WAVENUMBER, 1000.0, 0.5, POINTS);

    private final List<String> names = new ArrayList<>();
    private final List<double[]> absorptivities = new ArrayList<>();

    /**
     * @param random   source of line places and strengths
     * @param strength highest peak of a line, per unit amount
     */
    TwentyCompoundDesign(Random random, double strength) {
        for (int c = 0; c < COMPOUNDS; c++) {
            names.add(String.format("G%02d", c + 1));
            absorptivities.add(lines(random, 60, strength));
        }
    }

    private static double[] lines(Random random, int count, double strength) {
        double[] a = new double[POINTS];
        for (int l = 0; l < count; l++) {
            double centre = 1000 + 2000 * random.nextDouble();
            double peak = strength * random.nextDouble();
            for (int i = 0; i < POINTS; i++) {
                double d = (AXIS.get(i) - centre) / 1.0;
                a[i] += peak / (1 + d * d);
            }
        }
        return a;
    }

    String name(int compound) {
        return names.get(compound);
    }

    /** Absorbance per unit amount of a compound; not to be written. */
    double[] absorptivity(int compound) {
        return absorptivities.get(compound);
    }

    /** Compound c as an analyte fitted with all the others. */
    Analyte analyte(int compound) {
        List<String> others = new ArrayList<>(names);
        others.remove(compound);
        return new Analyte(names.get(compound), others, List.of(AnalysisRegion.of(1000, 1666, 1),
                AnalysisRegion.of(1666.5, 2333, 1), AnalysisRegion.of(2333.5, 2999.5, 1)));
    }

    /** The absorptivities as a 20 x 4,000 matrix, a copy. */
    double[][] matrix() {
        double[][] m = new double[COMPOUNDS][];
        for (int c = 0; c < COMPOUNDS; c++) {
            m[c] = absorptivities.get(c).clone();
        }
        return m;
    }

    /** The yardstick of the fit benchmarks: a plain matrix times a vector. */
    static double[] matrixVector(double[][] matrix, double[] vector) {
        double[] out = new double[matrix.length];
        for (int c = 0; c < matrix.length; c++) {
            double[] row = matrix[c];
            double sum = 0;
            for (int i = 0; i < vector.length; i++) {
                sum += row[i] * vector[i];
            }
            out[c] = sum;
        }
        return out;
    }
}
