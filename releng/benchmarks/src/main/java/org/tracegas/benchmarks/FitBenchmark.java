package org.tracegas.benchmarks;

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
import org.tracegas.quantify.CompoundResult;
import org.tracegas.quantify.PreparedMethod;
import org.tracegas.quantify.QuantificationMethod;
import org.tracegas.quantify.Quantifier;
import org.tracegas.quantify.ReferenceSpectrum;
import org.tracegas.quantify.Sample;
import org.tracegas.quantify.SpectrumResult;
import org.tracegas.spectrum.Ordinate;
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

    private Quantifier quantifier;
    private Sample sample;
    private double[][] matrix;
    private double[] vector;

    @Setup
    public void setUp() {
        Random random = new Random(2026);
        TwentyCompoundDesign design = new TwentyCompoundDesign(random, 2e-3);
        QuantificationMethod.Builder b = QuantificationMethod.builder("twenty compounds").pathLengthMetres(10);
        for (int c = 0; c < TwentyCompoundDesign.COMPOUNDS; c++) {
            b.analyte(design.analyte(c));
            b.reference(new ReferenceSpectrum(design.name(c), new Spectrum(TwentyCompoundDesign.AXIS,
                    scaled(design.absorptivity(c), 100), Ordinate.ABSORBANCE), 100));
        }
        quantifier = new Quantifier(PreparedMethod.prepare(b.build(), TwentyCompoundDesign.AXIS), "library", "bench",
                false);
        double[] mixture = new double[TwentyCompoundDesign.POINTS];
        for (int c = 0; c < TwentyCompoundDesign.COMPOUNDS; c++) {
            double amount = 5 + 50 * random.nextDouble();
            for (int i = 0; i < mixture.length; i++) {
                mixture[i] += design.absorptivity(c)[i] * amount;
            }
        }
        for (int i = 0; i < mixture.length; i++) {
            mixture[i] += 0.01 + 5e-4 * random.nextGaussian();
        }
        sample = Sample.of(new Spectrum(TwentyCompoundDesign.AXIS, mixture, Ordinate.ABSORBANCE));
        matrix = design.matrix();
        vector = mixture.clone();
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
        return TwentyCompoundDesign.matrixVector(matrix, vector);
    }
}
