package org.tracegas.benchmarks;

import java.util.Map;
import java.util.concurrent.TimeUnit;

import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.tracegas.importer.ImportException;
import org.tracegas.importer.ImportedData;
import org.tracegas.importer.jcamp.JcampReader;
import org.tracegas.importer.jcamp.JcampWriter;
import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;

/** JCAMP-DX writing (DIFDUP) and reading of a 32768-point absorbance spectrum. */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
public class ImportBenchmark {

    private Spectrum spectrum;
    private String text;
    private final JcampReader reader = new JcampReader();
    private final JcampWriter writer = JcampWriter.defaultPrecision();

    @Setup
    public void setUp() {
        int n = 32768;
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            y[i] = 0.5 * Math.exp(-Math.pow((i - 12000) / 80.0, 2)) + 0.01 * Math.sin(i * 0.01);
        }
        spectrum = new Spectrum(SpectralAxis.uniform(AxisUnit.WAVENUMBER, 500, 0.12, n), y, Ordinate.ABSORBANCE);
        text = writer.write(spectrum, "benchmark", Map.of());
    }

    @Benchmark
    public String writeJcamp() {
        return writer.write(spectrum, "benchmark", Map.of());
    }

    @Benchmark
    public ImportedData readJcamp() throws ImportException {
        return reader.read(text, "benchmark.jdx");
    }
}
