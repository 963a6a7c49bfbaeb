package org.tracegas.benchmarks;

import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;

import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.TearDown;
import org.openjdk.jmh.annotations.Warmup;
import org.tracegas.demo.DemoMethod;
import org.tracegas.importer.ImportException;
import org.tracegas.importer.ImportedData;
import org.tracegas.importer.container.ContainerReader;
import org.tracegas.importer.jcamp.JcampReader;
import org.tracegas.importer.jcamp.JcampWriter;
import org.tracegas.quantify.CompoundResult;
import org.tracegas.quantify.Sample;
import org.tracegas.spectrum.Spectrum;

/**
 * Whether reading JCAMP-DX is the bottleneck of a batch of absorbance spectra: one of the demo's absorbance
 * spectra (its whole transformed range) parsed from JCAMP-DX text in the compressed form an analyzer typically
 * exports (DIFDUP) and in plain AFFN, against the demo's 9-analyte fit of the same spectrum, in one run.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Fork(value = 1, jvmArgs = "-Xmx3g")
@Warmup(iterations = 3, time = 5)
@Measurement(iterations = 5, time = 5)
public class JcampVersusFitBenchmark {

    private DemoBatchFixture demo;
    private Sample sample;
    private String compressed;
    private String plain;
    private final JcampReader reader = new JcampReader();

    @Setup(Level.Trial)
    public void setUp() throws Exception {
        demo = new DemoBatchFixture("tracegas-jcamp-fit-bench", DemoMethod::method);
        Spectrum absorbance;
        try (ContainerReader container = ContainerReader.open(demo.hour)) {
            absorbance = demo.chain.process(container.next()).ratio().spectrum();
        }
        sample = Sample.of(absorbance);
        compressed = JcampWriter.defaultPrecision().write(absorbance, "stack minute", Map.of());
        plain = plainAffn(absorbance);
    }

    /** The same spectrum with one (x, y) pair per line, the uncompressed form some exports use. */
    private static String plainAffn(Spectrum s) {
        StringBuilder b = new StringBuilder(64 * s.size());
        b.append("##TITLE=stack minute\n##JCAMP-DX=5.01\n##DATA TYPE=INFRARED SPECTRUM\n##XUNITS=1/CM\n")
                .append("##YUNITS=ABSORBANCE\n##XFACTOR=1\n##YFACTOR=1\n##FIRSTX=").append(s.axis().get(0))
                .append("\n##LASTX=").append(s.axis().get(s.size() - 1)).append("\n##NPOINTS=").append(s.size())
                .append("\n##XYPOINTS=(XY..XY)\n");
        for (int i = 0; i < s.size(); i++) {
            b.append(s.axis().get(i)).append(", ").append(s.get(i)).append('\n');
        }
        return b.append("##END=\n").toString();
    }

    @TearDown(Level.Trial)
    public void tearDown() {
        demo.close();
    }

    @Benchmark
    public ImportedData parseCompressed() throws ImportException {
        return reader.read(compressed, "minute.jdx");
    }

    @Benchmark
    public ImportedData parsePlain() throws ImportException {
        return reader.read(plain, "minute.jdx");
    }

    @Benchmark
    public List<CompoundResult> fitDemoMethod() {
        return demo.quantifier.fit(sample);
    }
}
