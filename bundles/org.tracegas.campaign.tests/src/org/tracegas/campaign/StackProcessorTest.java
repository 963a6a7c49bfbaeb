package org.tracegas.campaign;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.time.Instant;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.Set;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.campaign.demo.DemoMethod;
import org.tracegas.campaign.demo.DemoPhysicsFixture;
import org.tracegas.importer.container.AcquisitionHeader;
import org.tracegas.importer.container.ContainerWriter;
import org.tracegas.importer.container.SampleKind;
import org.tracegas.library.ReferenceLibrary;
import org.tracegas.model.Role;
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
import org.tracegas.store.ProjectInfo;
import org.tracegas.store.Session;
import org.tracegas.store.VersionInfo;
import org.tracegas.store.VersionKind;
import org.tracegas.store.WorkspaceStore;
import org.tracegas.store.Workspaces;

/**
 * The batch path against a real H2 workspace file: interferograms in a container file come out as stored
 * measurements with their results, pointing at the method and library versions, with an intact audit chain.
 */
class StackProcessorTest {

    @TempDir
    Path folder;

    @Test
    void containerFileBecomesStoredResultsWithTheirVersions() throws Exception {
        DemoPhysicsFixture fixture = DemoPhysicsFixture.get();
        InterferogramTransform transform = new InterferogramTransform(DemoMethod.transform());
        Instant start = Instant.parse("2026-03-17T08:00:00Z");
        Background background = new Background("bg", start.minusSeconds(600),
                transform.singleBeam(fixture.interferogram(Map.of(), new Random(5))));
        Path file = folder.resolve("hour.tgc");
        List<Map<String, Double>> truth = List.of(Map.of("CO", 20.0, "NO", 80.0, "H2O", 100_000.0),
                Map.of("CO", 40.0, "NO", 90.0, "H2O", 110_000.0), Map.of("CO", 10.0, "NO", 70.0, "H2O", 90_000.0));
        try (ContainerWriter out = ContainerWriter.create(file)) {
            for (int i = 0; i < truth.size(); i++) {
                out.append(new AcquisitionHeader(fixture.zpd(), SampleKind.SAMPLE, start.plusSeconds(60L * i), 464.15,
                        1013.0, 4.85, Map.of()), fixture.interferogram(truth.get(i), new Random(i)));
            }
            out.commit();
        }
        ReferenceLibrary library = fixture.library(background.singleBeam().axis());
        QuantificationMethod method = DemoMethod.method(library);
        try (WorkspaceStore store = Workspaces.openH2(folder.resolve("db"))) {
            Session admin = store.users().createFirstAdministrator("admin", "Administrator", "pw-123456".toCharArray());
            store.users().createUser(admin, "ana", "Analyst", Set.of(Role.ANALYST), "pw-234567".toCharArray());
            Session analyst = store.users().logIn("ana", "pw-234567".toCharArray());
            ProjectInfo project = store.projects().createProject(analyst,
                    store.projects().createClient(analyst, "Client"), "P-1", "Project");
            VersionInfo lib = store.versions().create(analyst, VersionKind.LIBRARY, library.name(),
                    "sha=" + library.contentHash() + "\n", "test");
            VersionInfo met = store.versions().create(analyst, VersionKind.METHOD, method.name(),
                    method.canonicalText(), "test");
            SpectrumChain chain = new SpectrumChain(transform, new BackgroundRatio(),
                    new BackgroundTimeline(List.of(background)));
            Quantifier quantifier = new Quantifier(PreparedMethod.prepare(method, background.singleBeam().axis()),
                    library.contentHash(), "test", false);
            BatchOutcome outcome = new StackProcessor(store, analyst, project.id(), chain,
                    new BatchQuantifier(quantifier, 2), new AnalysisVersions(met.id(), lib.id()))
                    .run(List.of(file), truth.size(), ProgressListener.NONE, new CancellationFlag());

            assertEquals(truth.size(), outcome.delivered());
            assertFalse(outcome.cancelled());
            MinuteSeries series = MinuteSeries.of(store.projects().measurements(analyst, project.id()),
                    store.results().results(analyst, project.id()), met.id());
            assertEquals(lib.id(), series.libraryVersionId());
            for (int i = 0; i < truth.size(); i++) {
                MinuteSeries.Point co = series.compound("CO").get(i);
                assertEquals(start.plusSeconds(60L * i), co.time());
                assertEquals(truth.get(i).get("CO"), co.ppm(), 0.03 * truth.get(i).get("CO"));
                assertEquals(truth.get(i).get("NO"), series.compound("NO").get(i).ppm(), 0.03 * truth.get(i).get("NO"));
            }
            assertTrue(store.versions().version(met.id()).frozen(), "a method version is frozen once results use it");
            assertTrue(store.verifyAuditTrail().intact());
        }
    }
}
