package org.tracegas.benchmarks;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
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
import org.tracegas.campaign.AnalysisVersions;
import org.tracegas.campaign.BackgroundTimeline;
import org.tracegas.campaign.SpectrumChain;
import org.tracegas.campaign.StackProcessor;
import org.tracegas.campaign.demo.DemoCampaignFiles;
import org.tracegas.campaign.demo.DemoMethod;
import org.tracegas.campaign.demo.DemoPhysics;
import org.tracegas.importer.container.ContainerReader;
import org.tracegas.importer.container.ContainerRecord;
import org.tracegas.importer.container.SampleKind;
import org.tracegas.library.ReferenceLibrary;
import org.tracegas.model.Role;
import org.tracegas.preprocess.Background;
import org.tracegas.preprocess.BackgroundRatio;
import org.tracegas.preprocess.InterferogramTransform;
import org.tracegas.quantify.BatchQuantifier;
import org.tracegas.quantify.CancellationFlag;
import org.tracegas.quantify.PreparedMethod;
import org.tracegas.quantify.ProgressListener;
import org.tracegas.quantify.QuantificationMethod;
import org.tracegas.quantify.Quantifier;
import org.tracegas.quantify.Sample;
import org.tracegas.store.Session;
import org.tracegas.store.VersionInfo;
import org.tracegas.store.VersionKind;
import org.tracegas.store.WorkspaceStore;
import org.tracegas.store.Workspaces;

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

    private Path folder;
    private Path hour;
    private SpectrumChain chain;
    private Quantifier quantifier;
    private WorkspaceStore store;
    private Session analyst;
    private String projectId;
    private AnalysisVersions versions;

    @Setup(Level.Trial)
    public void setUp() throws Exception {
        folder = Files.createTempDirectory("tracegas-batch-bench");
        Path raw = folder.resolve("raw");
        DemoPhysics physics = DemoPhysics.fromInventedLineLists(folder.resolve("line-lists"));
        DemoCampaignFiles.write(raw, physics, ProgressListener.NONE, new CancellationFlag());
        hour = DemoCampaignFiles.stackFiles(raw).get(3);
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
        QuantificationMethod method = DemoMethod.method(library);
        quantifier = new Quantifier(PreparedMethod.prepare(method, backgrounds.get(0).singleBeam().axis()),
                library.contentHash(), "bench", false);
        store = Workspaces.openH2(folder.resolve("db"));
        Session admin = store.users().createFirstAdministrator("admin", "Admin", "bench-admin-1".toCharArray());
        store.users().createUser(admin, "ana", "Analyst", Set.of(Role.ANALYST), "bench-ana-12".toCharArray());
        analyst = store.users().logIn("ana", "bench-ana-12".toCharArray());
        projectId = store.projects().createProject(analyst, store.projects().createClient(analyst, "Client"), "B-1",
                "Benchmark").id();
        VersionInfo met = store.versions().create(analyst, VersionKind.METHOD, method.name(), method.canonicalText(),
                "bench");
        VersionInfo lib = store.versions().create(analyst, VersionKind.LIBRARY, library.name(),
                "sha=" + library.contentHash() + "\n", "bench");
        versions = new AnalysisVersions(met.id(), lib.id());
    }

    @TearDown(Level.Trial)
    public void tearDown() {
        store.close();
    }

    /** An hour of spectra end to end, stored with their results and audit records. */
    @Benchmark
    public long hourIntoTheWorkspace() {
        return new StackProcessor(store, analyst, projectId, chain, BatchQuantifier.onAllCores(quantifier), versions)
                .run(List.of(hour), 60, ProgressListener.NONE, new CancellationFlag()).delivered();
    }

    /** The bound: the same hour read, transformed, ratioed and fitted on all cores, nothing stored. */
    @Benchmark
    public long hourWithoutStorage() throws Exception {
        List<Sample> samples = new ArrayList<>();
        try (ContainerReader reader = ContainerReader.open(hour)) {
            while (reader.hasNext()) {
                samples.add(Sample.of(chain.process(reader.next()).ratio().spectrum()));
            }
        }
        long[] fitted = new long[1];
        BatchQuantifier.onAllCores(quantifier).run(samples.iterator(), samples.size(), r -> fitted[0]++,
                ProgressListener.NONE, new CancellationFlag());
        return fitted[0];
    }
}
