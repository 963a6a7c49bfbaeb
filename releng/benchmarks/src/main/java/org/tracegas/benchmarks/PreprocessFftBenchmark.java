package org.tracegas.benchmarks;

import java.util.Random;
import java.util.concurrent.TimeUnit;

import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.tracegas.preprocess.FftEngine;
import org.tracegas.preprocess.RealFft;
import pl.edu.icm.jlargearrays.ConcurrencyUtils;

/** The two real FFT engines on the same data in one run; the faster one is the default engine. */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
public class PreprocessFftBenchmark {

    @Param({"JTRANSFORMS", "COMMONS_MATH"})
    public FftEngine engine;

    @Param({"32768"})
    public int size;

    private RealFft fft;
    private double[] data;
    private double[] input;
    private double[] re;
    private double[] im;

    @Setup
    public void setUp() {
        // one thread per transform, as in the batch path, which runs one transform per worker thread
        ConcurrencyUtils.setNumberOfThreads(1);
        fft = engine.create(size);
        data = new Random(42).doubles(size).toArray();
        input = new double[size];
        re = new double[size / 2 + 1];
        im = new double[size / 2 + 1];
    }

    @Benchmark
    public double[] forward() {
        System.arraycopy(data, 0, input, 0, size); // forward uses its input as work space
        fft.forward(input, re, im);
        return re;
    }
}
