package org.tracegas.benchmarks;

import java.util.ArrayList;
import java.util.List;
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
import org.tracegas.campaign.StackProcessor;
import org.tracegas.campaign.demo.DemoMethod;
import org.tracegas.importer.container.ContainerReader;
import org.tracegas.quantify.BatchQuantifier;
import org.tracegas.quantify.CancellationFlag;
import org.tracegas.quantify.ProgressListener;
import org.tracegas.quantify.Sample;

/**
 * End-to-end batch throughput of the campaign path on all cores: an hour of the demo's interferograms (60)
 * read from their container file, transformed, ratioed, fitted with the demo's 9-analyte method and stored
 * with their audit records in an H2 workspace, against the same work without storage in the same run.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Fork(value = 1, jvmArgs = "-Xmx3g")
@Warmup(iterations = 2, time = 10)
@Measurement(iterations = 3, time = 20)
public class BatchBenchmark {

    private DemoBatchFixture demo;

    @Setup(Level.Trial)
    public void setUp() throws Exception {
        demo = new DemoBatchFixture("tracegas-batch-bench", DemoMethod::method);
    }

    @TearDown(Level.Trial)
    public void tearDown() {
        demo.close();
    }

    /** An hour of spectra end to end, stored with their results and audit records. */
    @Benchmark
    public long hourIntoTheWorkspace() {
        return new StackProcessor(demo.store, demo.analyst, demo.projectId, demo.chain,
                BatchQuantifier.onAllCores(demo.quantifier), demo.versions)
                .run(List.of(demo.hour), 60, ProgressListener.NONE, new CancellationFlag()).delivered();
    }

    /** The bound: the same hour read, transformed, ratioed and fitted on all cores, nothing stored. */
    @Benchmark
    public long hourWithoutStorage() throws Exception {
        List<Sample> samples = new ArrayList<>();
        try (ContainerReader reader = ContainerReader.open(demo.hour)) {
            while (reader.hasNext()) {
                samples.add(Sample.of(demo.chain.process(reader.next()).ratio().spectrum()));
            }
        }
        long[] fitted = new long[1];
        BatchQuantifier.onAllCores(demo.quantifier).run(samples.iterator(), samples.size(), r -> fitted[0]++,
                ProgressListener.NONE, new CancellationFlag());
        return fitted[0];
    }
}
