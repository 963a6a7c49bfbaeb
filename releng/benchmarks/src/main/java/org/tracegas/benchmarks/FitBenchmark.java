package org.tracegas.benchmarks;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.concurrent.TimeUnit;

import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.tracegas.quantify.AnalysisRegion;
import org.tracegas.quantify.Analyte;
import org.tracegas.quantify.CompoundResult;
import org.tracegas.quantify.PreparedMethod;
import org.tracegas.quantify.QuantificationMethod;
import org.tracegas.quantify.Quantifier;
import org.tracegas.quantify.ReferenceSpectrum;
import org.tracegas.quantify.Sample;
import org.tracegas.quantify.SpectrumResult;
import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;

/**
 * Per-spectrum fit of a method with 20 compounds (each an analyte fitted with the other 19 as interferents) in 3
 * regions with linear baselines over 4,000 points, against a plain 20 x 4,000 matrix-vector product in the same
 * run. The method is prepared (decompositions, pseudo-inverse) once in the setup. {@code fit} is the least-squares
 * fit with uncertainties, residuals and flags; {@code quantify} adds the reprocessing record, whose SHA-256 over
 * the 4,000-point spectrum costs extra.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
public class FitBenchmark {

    private static final int COMPOUNDS = 20;
    private static final int POINTS = 4000;
    private static final SpectralAxis AXIS = SpectralAxis.uniform(AxisUnit.WAVENUMBER, 1000.0, 0.5, POINTS);

    private Quantifier quantifier;
    private Sample sample;
    private double[][] matrix;
    private double[] vector;

    @Setup
    public void setUp() {
        Random random = new Random(2026);
        List<String> names = new ArrayList<>();
        List<double[]> absorptivities = new ArrayList<>();
        for (int c = 0; c < COMPOUNDS; c++) {
            names.add(String.format("G%02d", c + 1));
            absorptivities.add(lines(random, 60));
        }
        List<AnalysisRegion> regions = List.of(AnalysisRegion.of(1000, 1666, 1), AnalysisRegion.of(1666.5, 2333, 1),
                AnalysisRegion.of(2333.5, 2999.5, 1));
        QuantificationMethod.Builder b = QuantificationMethod.builder("twenty compounds").pathLengthMetres(10);
        for (int c = 0; c < COMPOUNDS; c++) {
            List<String> others = new ArrayList<>(names);
            others.remove(c);
            b.analyte(new Analyte(names.get(c), others, regions));
            b.reference(new ReferenceSpectrum(names.get(c), new Spectrum(AXIS, scaled(absorptivities.get(c), 100),
                    Ordinate.ABSORBANCE), 100));
        }
        quantifier = new Quantifier(PreparedMethod.prepare(b.build(), AXIS), "library", "bench", false);
        double[] mixture = new double[POINTS];
        for (int c = 0; c < COMPOUNDS; c++) {
            double amount = 5 + 50 * random.nextDouble();
            for (int i = 0; i < POINTS; i++) {
                mixture[i] += absorptivities.get(c)[i] * amount;
            }
        }
        for (int i = 0; i < POINTS; i++) {
            mixture[i] += 0.01 + 5e-4 * random.nextGaussian();
        }
        sample = Sample.of(new Spectrum(AXIS, mixture, Ordinate.ABSORBANCE));
        matrix = new double[COMPOUNDS][POINTS];
        for (int c = 0; c < COMPOUNDS; c++) {
            matrix[c] = absorptivities.get(c).clone();
        }
        vector = mixture.clone();
    }

    private static double[] lines(Random random, int count) {
        double[] a = new double[POINTS];
        for (int l = 0; l < count; l++) {
            double centre = 1000 + 2000 * random.nextDouble();
            double strength = 2e-3 * random.nextDouble();
            for (int i = 0; i < POINTS; i++) {
                double d = (AXIS.get(i) - centre) / 1.0;
                a[i] += strength / (1 + d * d);
            }
        }
        return a;
    }

    private static double[] scaled(double[] v, double factor) {
        double[] out = new double[v.length];
        for (int i = 0; i < v.length; i++) {
            out[i] = v[i] * factor;
        }
        return out;
    }

    @Benchmark
    public List<CompoundResult> fit() {
        return quantifier.fit(sample);
    }

    @Benchmark
    public SpectrumResult quantify() {
        return quantifier.quantify(sample);
    }

    /** The yardstick: a plain 20 x 4,000 matrix times a 4,000-vector. */
    @Benchmark
    public double[] matrixVector() {
        double[] out = new double[COMPOUNDS];
        for (int c = 0; c < COMPOUNDS; c++) {
            double[] row = matrix[c];
            double sum = 0;
            for (int i = 0; i < POINTS; i++) {
                sum += row[i] * vector[i];
            }
            out[c] = sum;
        }
        return out;
    }
}
