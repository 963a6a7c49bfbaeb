package org.tracegas.benchmarks;

import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryType;
import java.lang.management.MemoryUsage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Set;
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
import org.tracegas.campaign.AnalysisVersions;
import org.tracegas.campaign.BackgroundTimeline;
import org.tracegas.campaign.SpectrumChain;
import org.tracegas.campaign.StackProcessor;
import org.tracegas.campaign.demo.DemoCampaignFiles;
import org.tracegas.campaign.demo.DemoMethod;
import org.tracegas.campaign.demo.DemoPhysics;
import org.tracegas.campaign.demo.DemoScenario;
import org.tracegas.importer.container.ContainerReader;
import org.tracegas.importer.container.ContainerRecord;
import org.tracegas.importer.container.SampleKind;
import org.tracegas.library.ReferenceLibrary;
import org.tracegas.library.ReferenceSpectrum;
import org.tracegas.model.Role;
import org.tracegas.preprocess.Background;
import org.tracegas.preprocess.BackgroundRatio;
import org.tracegas.preprocess.InterferogramTransform;
import org.tracegas.quantify.AnalysisRegion;
import org.tracegas.quantify.Analyte;
import org.tracegas.quantify.BatchOutcome;
import org.tracegas.quantify.BatchQuantifier;
import org.tracegas.quantify.CancellationFlag;
import org.tracegas.quantify.PreparedMethod;
import org.tracegas.quantify.ProgressListener;
import org.tracegas.quantify.QuantificationMethod;
import org.tracegas.quantify.Quantifier;
import org.tracegas.quantify.ReportingUnit;
import org.tracegas.store.Session;
import org.tracegas.store.VersionInfo;
import org.tracegas.store.VersionKind;
import org.tracegas.store.WorkspaceStore;
import org.tracegas.store.Workspaces;

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

    private Path folder;
    private List<Path> files;
    private SpectrumChain chain;
    private Quantifier quantifier;
    private WorkspaceStore store;
    private Session analyst;
    private String projectId;
    private AnalysisVersions versions;

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
        folder = Files.createTempDirectory("tracegas-scale-bench");
        Path raw = folder.resolve("raw");
        DemoPhysics physics = DemoPhysics.fromInventedLineLists(folder.resolve("line-lists"));
        DemoCampaignFiles.write(raw, physics, ProgressListener.NONE, new CancellationFlag());
        Path hour = DemoCampaignFiles.stackFiles(raw).get(3);
        files = new ArrayList<>(Collections.nCopies((spectra + 59) / 60, hour));
        InterferogramTransform transform = new InterferogramTransform(DemoMethod.transform());
        List<Background> backgrounds = new ArrayList<>();
        try (ContainerReader reader = ContainerReader.open(DemoCampaignFiles.qaFile(raw))) {
            while (reader.hasNext()) {
                ContainerRecord r = reader.next();
                if (r.header().kind() == SampleKind.BACKGROUND) {
                    backgrounds.add(new Background(r.header().time().toString(), r.header().time(),
                            transform.singleBeam(r.interferogram())));
                }
            }
        }
        chain = new SpectrumChain(transform, new BackgroundRatio(), new BackgroundTimeline(backgrounds));
        ReferenceLibrary library = DemoMethod.library(physics, backgrounds.get(0).singleBeam().axis());
        QuantificationMethod method = coN2o(library);
        quantifier = new Quantifier(PreparedMethod.prepare(method, backgrounds.get(0).singleBeam().axis()),
                library.contentHash(), "bench", false);
        store = Workspaces.openH2(folder.resolve("db"));
        Session admin = store.users().createFirstAdministrator("admin", "Admin", "bench-admin-1".toCharArray());
        store.users().createUser(admin, "ana", "Analyst", Set.of(Role.ANALYST), "bench-ana-12".toCharArray());
        analyst = store.users().logIn("ana", "bench-ana-12".toCharArray());
        projectId = store.projects().createProject(analyst, store.projects().createClient(analyst, "Client"), "S-1",
                "Scale").id();
        VersionInfo met = store.versions().create(analyst, VersionKind.METHOD, method.name(), method.canonicalText(),
                "bench");
        VersionInfo lib = store.versions().create(analyst, VersionKind.LIBRARY, library.name(),
                "sha=" + library.contentHash() + "\n", "bench");
        versions = new AnalysisVersions(met.id(), lib.id());
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
        store.close();
    }

    @Benchmark
    public long batchInOneGibibyte(Heap heap) throws InterruptedException {
        HeapSampler sampler = new HeapSampler();
        Thread t = new Thread(sampler, "heap sampler");
        t.setDaemon(true);
        t.start();
        BatchOutcome outcome = new StackProcessor(store, analyst, projectId, chain,
                BatchQuantifier.onAllCores(quantifier), versions)
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
