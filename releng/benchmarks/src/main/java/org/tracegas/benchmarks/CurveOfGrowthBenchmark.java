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
import org.tracegas.quantify.FitAlgorithm;
import org.tracegas.quantify.PreparedMethod;
import org.tracegas.quantify.QuantificationMethod;
import org.tracegas.quantify.Quantifier;
import org.tracegas.quantify.ReferenceSpectrum;
import org.tracegas.quantify.Sample;
import org.tracegas.quantify.ShiftTerm;
import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.SpectralAxis;
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

    private static final int COMPOUNDS = 20;
    private static final int POINTS = 4000;
    private static final double[] AMOUNTS = {25, 50, 100};
    private static final SpectralAxis AXIS = SpectralAxis.uniform(AxisUnit.WAVENUMBER, 1000.0, 0.5, POINTS);

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
            for (double amount : AMOUNTS) {
                b.reference(new ReferenceSpectrum(names.get(c), new Spectrum(AXIS,
                        saturated(absorptivities.get(c), amount), Ordinate.ABSORBANCE), amount));
            }
        }
        linear = quantifier(b.nonlinearity(false).build());
        interpolated = quantifier(b.nonlinearity(true).build());
        b.nonlinearity(false).algorithm(FitAlgorithm.CURVE_OF_GROWTH);
        curveOfGrowth = quantifier(b.build());
        curveOfGrowthWithScale = quantifier(b.shiftTerm(ShiftTerm.SCALE).build());
        double[] mixture = new double[POINTS];
        for (int c = 0; c < COMPOUNDS; c++) {
            double[] a = saturated(absorptivities.get(c), 5 + 90 * random.nextDouble());
            for (int i = 0; i < POINTS; i++) {
                mixture[i] += a[i];
            }
        }
        for (int i = 0; i < POINTS; i++) {
            mixture[i] += 0.01 + 5e-4 * random.nextGaussian();
        }
        sample = Sample.of(new Spectrum(AXIS, mixture, Ordinate.ABSORBANCE));
        matrix = new double[COMPOUNDS][];
        for (int c = 0; c < COMPOUNDS; c++) {
            matrix[c] = absorptivities.get(c).clone();
        }
        vector = mixture.clone();
    }

    private static Quantifier quantifier(QuantificationMethod method) {
        return new Quantifier(PreparedMethod.prepare(method, AXIS), "library", "bench", false);
    }

    private static double[] lines(Random random, int count) {
        double[] a = new double[POINTS];
        for (int l = 0; l < count; l++) {
            double centre = 1000 + 2000 * random.nextDouble();
            double strength = 4e-3 * random.nextDouble();
            for (int i = 0; i < POINTS; i++) {
                double d = (AXIS.get(i) - centre) / 1.0;
                a[i] += strength / (1 + d * d);
            }
        }
        return a;
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
