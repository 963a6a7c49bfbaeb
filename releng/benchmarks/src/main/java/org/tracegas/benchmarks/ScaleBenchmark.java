package org.tracegas.benchmarks;

import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryType;
import java.lang.management.MemoryUsage;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.concurrent.TimeUnit;

import org.openjdk.jmh.annotations.AuxCounters;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.TearDown;
import org.openjdk.jmh.annotations.Warmup;
import org.tracegas.pipeline.StackProcessor;
import org.tracegas.demo.DemoScenario;
import org.tracegas.library.ReferenceLibrary;
import org.tracegas.library.ReferenceSpectrum;
import org.tracegas.quantify.AnalysisRegion;
import org.tracegas.quantify.Analyte;
import org.tracegas.quantify.BatchOutcome;
import org.tracegas.quantify.BatchQuantifier;
import org.tracegas.quantify.CancellationFlag;
import org.tracegas.quantify.ProgressListener;
import org.tracegas.quantify.QuantificationMethod;
import org.tracegas.quantify.ReportingUnit;

/**
 * Memory of a large batch: 100,000 of the demo's interferograms (its hour file read over and over) through the
 * whole batch path (read, transform, ratio, fit on all cores, block storage with audit records into an H2
 * workspace) in a JVM limited to 1 GiB of heap. The counters report the largest heap in use and the largest
 * heap left after a collection (the live set), sampled through the run, and the latter's ratio to the 1 GiB
 * bound. A linear CO/N2O method keeps the run short; the method does not change what the batch path holds.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.SingleShotTime)
@OutputTimeUnit(TimeUnit.SECONDS)
@Fork(value = 1, jvmArgs = { "-Xmx1g", "-Xms1g" })
@Warmup(iterations = 0)
@Measurement(iterations = 1)
public class ScaleBenchmark {

    private static final long ONE_GIB = 1L << 30;

    @Param("100000")
    public int spectra;

    private DemoBatchFixture demo;
    private List<Path> files;

    /** Heap figures of the run, reported by JMH beside the time. */
    @State(Scope.Thread)
    @AuxCounters(AuxCounters.Type.EVENTS)
    public static class Heap {
        public double peakUsedMiB;
        public double peakLiveMiB;
        public double liveToBound;
        public long stored;
    }

    @Setup(Level.Trial)
    public void setUp() throws Exception {
        demo = new DemoBatchFixture("tracegas-scale-bench", ScaleBenchmark::coN2o);
        files = new ArrayList<>(Collections.nCopies((spectra + 59) / 60, demo.hour));
    }

    private static QuantificationMethod coN2o(ReferenceLibrary library) {
        QuantificationMethod.Builder b = QuantificationMethod.builder("Scale run CO and N2O")
                .pathLengthMetres(DemoScenario.PATH_LENGTH).nonlinearity(false).reportingUnit(ReportingUnit.PPM);
        b.analyte(new Analyte("CO", List.of("CO2", "N2O"), List.of(AnalysisRegion.of(2040, 2140, 1))));
        b.analyte(new Analyte("N2O", List.of("CO", "CO2"), List.of(AnalysisRegion.of(2190, 2260, 1))));
        for (ReferenceSpectrum r : library.references()) {
            String compound = r.compound().name();
            if (compound.equals("CO") || compound.equals("N2O") || compound.equals("CO2")) {
                b.reference(new org.tracegas.quantify.ReferenceSpectrum(compound, r.spectrum(),
                        r.metadata().conditions().concentrationPathLength()));
            }
        }
        return b.build();
    }

    @TearDown(Level.Trial)
    public void tearDown() {
        demo.close();
    }

    @Benchmark
    public long batchInOneGibibyte(Heap heap) throws InterruptedException {
        HeapSampler sampler = new HeapSampler();
        Thread t = new Thread(sampler, "heap sampler");
        t.setDaemon(true);
        t.start();
        BatchOutcome outcome = new StackProcessor(demo.store, demo.analyst, demo.projectId, demo.chain,
                BatchQuantifier.onAllCores(demo.quantifier), demo.versions)
                .run(files, spectra, ProgressListener.NONE, new CancellationFlag());
        sampler.stop();
        t.join();
        heap.peakUsedMiB = sampler.peakUsed / 1048576.0;
        heap.peakLiveMiB = sampler.peakLive / 1048576.0;
        heap.liveToBound = (double) sampler.peakLive / ONE_GIB;
        heap.stored = outcome.delivered();
        System.out.printf("%n%d spectra stored; heap in use at most %.0f MiB, after collections at most %.0f MiB "
                + "(%.2f of 1 GiB)%n", outcome.delivered(), heap.peakUsedMiB, heap.peakLiveMiB, heap.liveToBound);
        return outcome.delivered();
    }

    /** Samples heap use every 50 ms; the heap pools' usage after their last collection is the live set. */
    private static final class HeapSampler implements Runnable {

        private volatile boolean running = true;
        private long peakUsed;
        private long peakLive;

        void stop() {
            running = false;
        }

        @Override
        public void run() {
            List<MemoryPoolMXBean> heapPools = ManagementFactory.getMemoryPoolMXBeans().stream()
                    .filter(p -> p.getType() == MemoryType.HEAP).toList();
            while (running) {
                long used = 0;
                long live = 0;
                for (MemoryPoolMXBean p : heapPools) {
                    used += p.getUsage().getUsed();
                    MemoryUsage afterGc = p.getCollectionUsage();
                    live += afterGc == null ? 0 : afterGc.getUsed();
                }
                peakUsed = Math.max(peakUsed, used);
                peakLive = Math.max(peakLive, live);
                try {
                    Thread.sleep(50);
                } catch (InterruptedException e) {
                    return;
                }
            }
        }
    }
}
