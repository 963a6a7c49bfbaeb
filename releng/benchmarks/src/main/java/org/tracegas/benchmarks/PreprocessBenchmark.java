package org.tracegas.benchmarks;

import java.time.Instant;
import java.util.concurrent.TimeUnit;

import org.jtransforms.fft.DoubleFFT_1D;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.tracegas.preprocess.Background;
import org.tracegas.preprocess.BackgroundRatio;
import org.tracegas.preprocess.InterferogramTransform;
import org.tracegas.preprocess.TransformSettings;
import org.tracegas.spectrum.Interferogram;
import org.tracegas.spectrum.Spectrum;
import pl.edu.icm.jlargearrays.ConcurrencyUtils;

/**
 * A 2^15-point single-sided interferogram to absorbance (DC removal, apodization, zero filling, FFT, Mertz phase,
 * ratio to a background, log10) against a bare real FFT of 2^15 points, in one run. With zero filling 1 the chain
 * transforms the same length as the bare FFT; with 2 it transforms twice the length. The range sets how many
 * spectral points are phase corrected, ratioed and logged.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
public class PreprocessBenchmark {

    private static final int N = 1 << 15;
    private static final double LASER = 15798.0;

    @Param({"1", "2"})
    public int zeroFill;

    /** "full": 0 cm-1 to the Nyquist wavenumber; else low-high in cm-1 (a mid-infrared detector range). */
    @Param({"full", "500-4000"})
    public String range;

    private Interferogram sample;
    private InterferogramTransform transform;
    private BackgroundRatio ratio;
    private Background background;
    private Instant sampleTime;
    private DoubleFFT_1D plan;
    private double[] data;
    private double[] work;

    @Setup
    public void setUp() {
        // one thread per transform, as in the batch path, which runs one transform per worker thread
        ConcurrencyUtils.setNumberOfThreads(1);
        TransformSettings settings = TransformSettings.defaults().withZeroFillFactor(zeroFill);
        if (!"full".equals(range)) {
            String[] bounds = range.split("-");
            settings = settings.withRange(Double.parseDouble(bounds[0]), Double.parseDouble(bounds[1]));
        }
        transform = new InterferogramTransform(settings);
        Interferogram backgroundIfg = interferogram(false);
        sample = interferogram(true);
        Instant measured = Instant.parse("2026-03-01T06:00:00Z");
        background = new Background("bg", measured, transform.singleBeam(backgroundIfg));
        sampleTime = measured.plusSeconds(3600);
        ratio = new BackgroundRatio();
        plan = new DoubleFFT_1D(N);
        data = sample.toArray();
        work = new double[N];
    }

    /** A broad source envelope from 500 to 4000 cm-1, with absorption lines for the sample. */
    private static Interferogram interferogram(boolean absorbing) {
        double dx = 1.0 / LASER;
        int zpd = 1024;
        double[] x = new double[N];
        for (double s = 500; s <= 4000; s += 7.3) {
            double envelope = Math.sin(Math.PI * (s - 500) / 3500);
            double amplitude = envelope * (absorbing && ((int) s) % 3 == 0 ? 0.7 : 1.0);
            double w = 2 * Math.PI * s * dx;
            for (int i = 0; i < N; i++) {
                x[i] += amplitude * Math.cos(w * (i - zpd));
            }
        }
        for (int i = 0; i < N; i++) {
            x[i] += 20.0 + 1e-3 * Math.sin(i * 0.7); // DC level and a little noise-like ripple
        }
        return new Interferogram(x, LASER, 1);
    }

    @Benchmark
    public Spectrum interferogramToAbsorbance() {
        Spectrum singleBeam = transform.singleBeam(sample);
        return ratio.absorbance(singleBeam, sampleTime, background).spectrum();
    }

    @Benchmark
    public double[] bareRealFft() {
        System.arraycopy(data, 0, work, 0, N);
        plan.realForward(work);
        return work;
    }
}
