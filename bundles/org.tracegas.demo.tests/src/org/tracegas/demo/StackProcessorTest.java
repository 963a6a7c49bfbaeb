package org.tracegas.demo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.Set;

import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.importer.container.AcquisitionHeader;
import org.tracegas.importer.container.ContainerWriter;
import org.tracegas.importer.container.SampleKind;
import org.tracegas.library.ReferenceLibrary;
import org.tracegas.method.StoredMethod;
import org.tracegas.model.ContentVersion;
import org.tracegas.model.Measurement;
import org.tracegas.model.Project;
import org.tracegas.model.Role;
import org.tracegas.model.VersionKind;
import org.tracegas.pipeline.AnalysisVersions;
import org.tracegas.pipeline.BackgroundTimeline;
import org.tracegas.pipeline.SpectrumChain;
import org.tracegas.pipeline.StackProcessor;
import org.tracegas.preprocess.Background;
import org.tracegas.preprocess.BackgroundRatio;
import org.tracegas.preprocess.InterferogramTransform;
import org.tracegas.quantify.BatchOutcome;
import org.tracegas.quantify.BatchQuantifier;
import org.tracegas.quantify.CancellationFlag;
import org.tracegas.quantify.PreparedMethod;
import org.tracegas.quantify.ProgressListener;
import org.tracegas.quantify.QuantificationMethod;
import org.tracegas.quantify.Quantifier;
import org.tracegas.report.campaign.MinuteSeries;
import org.tracegas.spectrum.Interferogram;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;
import org.tracegas.store.Workspaces;

/**
 * The batch path against a real H2 workspace file: interferograms in a container file come out as stored
 * measurements with their results, pointing at the method and library versions, with an intact audit chain;
 * stored in blocks, nothing fitted before a stop is lost.
 */
class StackProcessorTest {

    private static final Instant START = Instant.parse("2026-03-17T08:00:00Z");
    private static final List<Map<String, Double>> TRUTH = List.of(Map.of("CO", 20.0, "NO", 80.0, "H2O", 100_000.0),
            Map.of("CO", 40.0, "NO", 90.0, "H2O", 110_000.0), Map.of("CO", 10.0, "NO", 70.0, "H2O", 90_000.0));

    @TempDir
    Path folder;

    private DemoPhysicsFixture fixture;
    private InterferogramTransform transform;
    private Background background;
    private QuantificationMethod method;
    private ReferenceLibrary library;
    private WorkspaceStore store;
    private Session analyst;
    private Project project;
    private ContentVersion met;
    private ContentVersion lib;

    @BeforeEach
    void setUp() throws Exception {
        fixture = DemoPhysicsFixture.get();
        transform = new InterferogramTransform(DemoMethod.transform());
        background = new Background("bg", START.minusSeconds(600),
                transform.singleBeam(fixture.interferogram(Map.of(), new Random(5))));
        library = fixture.library(background.singleBeam().axis());
        method = DemoMethod.method(library);
        store = Workspaces.openH2(folder.resolve("db"));
        Session admin = store.users().createFirstAdministrator("admin", "Administrator", "pw-123456".toCharArray());
        store.users().createUser(admin, "ana", "Analyst", Set.of(Role.ANALYST), "pw-234567".toCharArray());
        analyst = store.users().logIn("ana", "pw-234567".toCharArray());
        project = store.projects().createProject(analyst, store.projects().createClient(analyst, "Client").getId(),
                "P-1",
                "Project");
        lib = store.versions().create(analyst, VersionKind.LIBRARY, library.name(),
                "sha=" + library.contentHash() + "\n", "test");
        met = store.versions().create(analyst, VersionKind.METHOD, method.name(),
                new StoredMethod(method, DemoMethod.transform(), lib.getId(), library.contentHash()).content(), "test");
    }

    @AfterEach
    void tearDown() {
        store.close();
    }

    /**
     * A container of one record a minute with the given concentrations; record {@code bad} lacks the last quarter
     * of its interferogram, so it cannot be processed like the others.
     */
    private Path container(String name, List<Map<String, Double>> truth, int bad) throws Exception {
        Path file = folder.resolve(name);
        try (ContainerWriter out = ContainerWriter.create(file)) {
            for (int i = 0; i < truth.size(); i++) {
                Interferogram full = fixture.interferogram(truth.get(i), new Random(i));
                Interferogram written = i != bad ? full : new Interferogram(Arrays.copyOf(full.toArray(),
                        full.size() * 3 / 4), full.laserWavenumber(), full.samplingInterval());
                out.append(new AcquisitionHeader(fixture.zpd(), SampleKind.SAMPLE, START.plusSeconds(60L * i), 438.15,
                        1013.0, 6.4, Map.of()), written);
            }
            out.commit();
        }
        return file;
    }

    private StackProcessor processor(int blockSize) {
        return processor(blockSize, 2);
    }

    private StackProcessor processor(int blockSize, int threads) {
        SpectrumChain chain = new SpectrumChain(transform, new BackgroundRatio(),
                new BackgroundTimeline(List.of(background)));
        Quantifier quantifier = new Quantifier(PreparedMethod.prepare(method, background.singleBeam().axis()),
                library.contentHash(), "test", false);
        return new StackProcessor(store, analyst, project.getId(), chain, new BatchQuantifier(quantifier, threads),
                new AnalysisVersions(met.getId(), lib.getId()), blockSize);
    }

    @Test
    void containerFileBecomesStoredResultsWithTheirVersions() throws Exception {
        Path file = container("hour.tgc", TRUTH, -1);
        BatchOutcome outcome = processor(StackProcessor.DEFAULT_BLOCK_SIZE).run(List.of(file), TRUTH.size(),
                ProgressListener.NONE, new CancellationFlag());

        assertEquals(TRUTH.size(), outcome.delivered());
        assertFalse(outcome.cancelled());
        MinuteSeries series = MinuteSeries.of(store.projects().measurements(analyst, project.getId()),
                store.results().results(analyst, project.getId()), met.getId());
        assertEquals(lib.getId(), series.libraryVersionId());
        for (int i = 0; i < TRUTH.size(); i++) {
            MinuteSeries.Point co = series.compound("CO").get(i);
            assertEquals(START.plusSeconds(60L * i), co.time());
            // 3 % of the simulated concentration: the demo physics' own tolerance, common practice, no source
            assertEquals(TRUTH.get(i).get("CO"), co.ppm(), 0.03 * TRUTH.get(i).get("CO"));
            assertEquals(TRUTH.get(i).get("NO"), series.compound("NO").get(i).ppm(), 0.03 * TRUTH.get(i).get("NO"));
        }
        assertTrue(store.versions().version(met.getId()).isFrozen(), "a method version is frozen once results use it");
        assertTrue(store.verifyAuditTrail().intact());
    }

    @Test
    void blocksAreStoredWholeAndProgressCountsStoredSpectra() throws Exception {
        List<Map<String, Double>> truth = List.of(TRUTH.get(0), TRUTH.get(1), TRUTH.get(2), TRUTH.get(0),
                TRUTH.get(1));
        Path file = container("five.tgc", truth, -1);
        List<long[]> told = new ArrayList<>();

        BatchOutcome outcome = processor(2).run(List.of(file), truth.size(),
                (done, total) -> told.add(new long[] {done, total}), new CancellationFlag());

        assertEquals(5, outcome.delivered());
        assertEquals(List.of("1/5", "3/5", "5/5"), told.stream().map(t -> t[0] + "/" + t[1]).toList(),
                "told once per stored block: the first one short, so that storing starts early");
        assertEquals(5, store.projects().measurements(analyst, project.getId()).size());
        assertEquals(5 * method.analytes().size(), store.results().results(analyst, project.getId()).size());
        assertTrue(store.verifyAuditTrail().intact());
    }

    @Test
    void cancelledRunHasStoredWhatItReported() throws Exception {
        Path file = container("five.tgc", List.of(TRUTH.get(0), TRUTH.get(1), TRUTH.get(2), TRUTH.get(0),
                TRUTH.get(1)), -1);
        CancellationFlag cancel = new CancellationFlag();

        BatchOutcome outcome = processor(2).run(List.of(file), 5, (done, total) -> cancel.cancel(), cancel);

        // the first block is told once stored, while the next spectra are fitted: the cancel stops the run
        // somewhere after it, or comes after the last spectrum was delivered; either way what was delivered is stored
        assertTrue(outcome.delivered() >= 1, outcome.delivered() + " delivered");
        assertEquals(outcome.cancelled(), outcome.delivered() < 5, outcome.delivered() + " delivered");
        assertEquals(outcome.delivered(), store.projects().measurements(analyst, project.getId()).size());
    }

    @Test
    void recordThatCannotBeProcessedLeavesEverySpectrumFittedBeforeItStored() throws Exception {
        List<Map<String, Double>> truth = new ArrayList<>();
        for (int i = 0; i < 6; i++) {
            truth.add(TRUTH.get(i % TRUTH.size()));
        }
        // the sixth record cannot be transformed on the axis; it is processed on a worker like the others, so
        // its error comes in input order, after the five before it were delivered
        Path file = container("broken.tgc", truth, 5);

        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> processor(StackProcessor.DEFAULT_BLOCK_SIZE, 1).run(List.of(file), truth.size(),
                        ProgressListener.NONE, new CancellationFlag()));

        assertTrue(e.getMessage().startsWith("sample 5: ") && e.getMessage().contains("axis"), e.getMessage());
        List<Measurement> stored = store.projects().measurements(analyst, project.getId());
        // results are delivered in order, so what was stored is the first spectra, each with all its results
        assertEquals(5, stored.size(), stored.size() + " spectra stored");
        for (int i = 0; i < stored.size(); i++) {
            assertEquals(START.plusSeconds(60L * i), stored.get(i).getTime());
        }
        assertEquals(stored.size() * method.analytes().size(), store.results().results(analyst,
                project.getId()).size());
    }
}
