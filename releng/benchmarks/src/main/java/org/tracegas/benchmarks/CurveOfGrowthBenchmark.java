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
import org.tracegas.quantify.FitAlgorithm;
import org.tracegas.quantify.PreparedMethod;
import org.tracegas.quantify.QuantificationMethod;
import org.tracegas.quantify.Quantifier;
import org.tracegas.quantify.ReferenceSpectrum;
import org.tracegas.quantify.Sample;
import org.tracegas.quantify.ShiftTerm;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.Spectrum;

/**
 * The fits of one design with every algorithm, against each other and a plain matrix-vector product, in one run:
 * 20 compounds (each an analyte fitted with the other 19), each with references at three amounts whose lines
 * saturate, 3 regions with linear baselines, 4,000 points. {@code linear} is the classical least-squares fit on the
 * pooled references, {@code interpolated} the classical fit that interpolates the absorptivity between references
 * at the current estimate, {@code curveOfGrowth} the joint non-linear fit of the curves of growth, {@code
 * curveOfGrowthWithScale} the same with the wavenumber scale term. Methods are prepared in the setup.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
public class CurveOfGrowthBenchmark {

    private static final double[] AMOUNTS = {25, 50, 100};

    private Quantifier linear;
    private Quantifier interpolated;
    private Quantifier curveOfGrowth;
    private Quantifier curveOfGrowthWithScale;
    private Sample sample;
    private double[][] matrix;
    private double[] vector;

    @Setup
    public void setUp() {
        Random random = new Random(2026);
        TwentyCompoundDesign design = new TwentyCompoundDesign(random, 4e-3);
        QuantificationMethod.Builder b = QuantificationMethod.builder("twenty compounds").pathLengthMetres(10);
        for (int c = 0; c < TwentyCompoundDesign.COMPOUNDS; c++) {
            b.analyte(design.analyte(c));
            for (double amount : AMOUNTS) {
                b.reference(new ReferenceSpectrum(design.name(c), new Spectrum(TwentyCompoundDesign.AXIS,
                        saturated(design.absorptivity(c), amount), Ordinate.ABSORBANCE), amount));
            }
        }
        linear = quantifier(b.nonlinearity(false).build());
        interpolated = quantifier(b.nonlinearity(true).build());
        b.nonlinearity(false).algorithm(FitAlgorithm.CURVE_OF_GROWTH);
        curveOfGrowth = quantifier(b.build());
        curveOfGrowthWithScale = quantifier(b.shiftTerm(ShiftTerm.SCALE).build());
        double[] mixture = new double[TwentyCompoundDesign.POINTS];
        for (int c = 0; c < TwentyCompoundDesign.COMPOUNDS; c++) {
            double[] a = saturated(design.absorptivity(c), 5 + 90 * random.nextDouble());
            for (int i = 0; i < mixture.length; i++) {
                mixture[i] += a[i];
            }
        }
        for (int i = 0; i < mixture.length; i++) {
            mixture[i] += 0.01 + 5e-4 * random.nextGaussian();
        }
        sample = Sample.of(new Spectrum(TwentyCompoundDesign.AXIS, mixture, Ordinate.ABSORBANCE));
        matrix = design.matrix();
        vector = mixture.clone();
    }

    private static Quantifier quantifier(QuantificationMethod method) {
        return new Quantifier(PreparedMethod.prepare(method, TwentyCompoundDesign.AXIS), "library", "bench", false);
    }

    /** Absorbance at an amount, bending over as it grows: k a / (1 + k a). */
    private static double[] saturated(double[] k, double amount) {
        double[] out = new double[k.length];
        for (int i = 0; i < k.length; i++) {
            out[i] = k[i] * amount / (1 + k[i] * amount);
        }
        return out;
    }

    @Benchmark
    public List<CompoundResult> linear() {
        return linear.fit(sample);
    }

    @Benchmark
    public List<CompoundResult> interpolated() {
        return interpolated.fit(sample);
    }

    @Benchmark
    public List<CompoundResult> curveOfGrowth() {
        return curveOfGrowth.fit(sample);
    }

    @Benchmark
    public List<CompoundResult> curveOfGrowthWithScale() {
        return curveOfGrowthWithScale.fit(sample);
    }

    /** The yardstick: a plain 20 x 4,000 matrix times a 4,000-vector. */
    @Benchmark
    public double[] matrixVector() {
        return TwentyCompoundDesign.matrixVector(matrix, vector);
    }
}
