package org.tracegas.benchmarks;

import java.util.concurrent.TimeUnit;

import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OperationsPerInvocation;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.TearDown;
import org.openjdk.jmh.annotations.Warmup;
import org.tracegas.pipeline.StackProcessor;
import org.tracegas.demo.DemoMethod;
import org.tracegas.quantify.BatchQuantifier;
import org.tracegas.quantify.CancellationFlag;
import org.tracegas.quantify.ProgressListener;

/**
 * End-to-end batch throughput of the campaign path, in spectra per second: six hours of the demo's
 * interferograms (360, several blocks, so that storing one block overlaps fitting the next) read from their
 * container files, transformed, ratioed, fitted with the demo's 9-analyte method and stored
 * with their audit records in an H2 workspace, against the same work without storage in the same run. Each
 * fork runs on {@link #cores} processors: the setup restricts the whole JVM (workers, reader, compiler and
 * collector threads) to that many CPUs with util-linux {@code taskset}, so that the scaling from 1 to 2 cores
 * is measured in one run. A whole day (1,440) is measured too: a run fills the pipeline at its start and drains
 * the storage at its end on one thread, and a campaign's batch is long, so the day shows what a year's run does
 * between its ends.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.Throughput)
@OutputTimeUnit(TimeUnit.SECONDS)
@OperationsPerInvocation(BatchBenchmark.SPECTRA)
@Fork(value = 1, jvmArgs = "-Xmx3g")
@Warmup(iterations = 2, time = 10)
@Measurement(iterations = 3, time = 20)
public class BatchBenchmark {

    /** Interferograms in six hours of the demo. */
    static final int SPECTRA = 360;

    /** Interferograms in the demo's day. */
    static final int DAY = 1440;

    /** Processors the fork's JVM runs on: CPUs 0 to cores - 1. */
    @Param({ "1", "2" })
    public int cores;

    private DemoBatchFixture demo;

    @Setup(Level.Trial)
    public void setUp() throws Exception {
        pinTo(cores);
        demo = new DemoBatchFixture("tracegas-batch-bench", DemoMethod::method);
    }

    /**
     * Restricts every thread of this JVM, and so every thread they start, to the first CPUs; the JVM's processor
     * count follows, so {@link BatchQuantifier#onAllCores} starts that many workers.
     */
    private static void pinTo(int cores) throws Exception {
        if (cores > Runtime.getRuntime().availableProcessors()) {
            throw new IllegalStateException("cores " + cores + " exceeds the " + Runtime.getRuntime()
                    .availableProcessors() + " processors of this machine");
        }
        // a thread that ends while taskset walks the JVM's threads fails the call: try again, a little later
        for (int attempt = 0; attempt < 50 && Runtime.getRuntime().availableProcessors() != cores; attempt++) {
            if (attempt > 0) {
                Thread.sleep(20);
            }
            new ProcessBuilder("taskset", "--all-tasks", "--pid", "--cpu-list", "0-" + (cores - 1),
                    Long.toString(ProcessHandle.current().pid())).redirectErrorStream(true)
                    .redirectOutput(ProcessBuilder.Redirect.DISCARD).start().waitFor();
        }
        if (Runtime.getRuntime().availableProcessors() != cores) {
            throw new IllegalStateException("could not restrict the benchmark to " + cores + " CPUs with taskset");
        }
    }

    @TearDown(Level.Trial)
    public void tearDown() {
        demo.close();
    }

    /** Six hours of spectra end to end, stored with their results and audit records. */
    @Benchmark
    public long sixHoursIntoTheWorkspace() {
        return processor().run(demo.sixHours, SPECTRA, ProgressListener.NONE, new CancellationFlag()).delivered();
    }

    /** The demo's whole day of spectra end to end, stored with their results and audit records. */
    @Benchmark
    @OperationsPerInvocation(DAY)
    public long aDayIntoTheWorkspace() {
        return processor().run(demo.day, DAY, ProgressListener.NONE, new CancellationFlag()).delivered();
    }

    /**
     * The bound: the same six hours read, transformed, ratioed and fitted on all cores, made ready for storing
     * in memory by the same path, nothing stored.
     */
    @Benchmark
    public long sixHoursWithoutStorage() {
        return processor().process(demo.sixHours, new CancellationFlag()).size();
    }

    /** The demo's batch path into the fixture's workspace, its workers on all the fork's cores. */
    private StackProcessor processor() {
        return new StackProcessor(demo.store, demo.analyst, demo.projectId, demo.chain,
                BatchQuantifier.onAllCores(demo.quantifier), demo.versions);
    }
}
