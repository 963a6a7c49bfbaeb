package org.tracegas.benchmarks;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Set;
import java.util.function.Function;
import java.util.stream.Stream;

import org.tracegas.demo.DemoCampaignFiles;
import org.tracegas.demo.DemoMethod;
import org.tracegas.demo.DemoPhysics;
import org.tracegas.importer.container.ContainerReader;
import org.tracegas.importer.container.ContainerRecord;
import org.tracegas.importer.container.SampleKind;
import org.tracegas.library.ReferenceLibrary;
import org.tracegas.model.ContentVersion;
import org.tracegas.model.Role;
import org.tracegas.model.VersionKind;
import org.tracegas.pipeline.AnalysisVersions;
import org.tracegas.pipeline.BackgroundTimeline;
import org.tracegas.pipeline.SpectrumChain;
import org.tracegas.preprocess.Background;
import org.tracegas.preprocess.BackgroundRatio;
import org.tracegas.preprocess.InterferogramTransform;
import org.tracegas.quantify.CancellationFlag;
import org.tracegas.quantify.PreparedMethod;
import org.tracegas.quantify.ProgressListener;
import org.tracegas.quantify.QuantificationMethod;
import org.tracegas.quantify.Quantifier;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;
import org.tracegas.store.Workspaces;

/**
 * The batch benchmarks' common ground: the demo day's raw files in a temporary folder, the demo's processing
 * chain, a quantifier for a method over the demo library, and an H2 workspace with an analyst, a project and
 * the method and library versions the results name.
 */
final class DemoBatchFixture implements AutoCloseable {

    final Path folder;
    /** One hour (60) of the demo's stack-gas interferograms. */
    final Path hour;
    /** Six hours (360) of the demo's stack-gas interferograms, one file an hour, starting with {@link #hour}. */
    final List<Path> sixHours;
    /** The demo's whole day of stack interferograms (1,440), 24 files. */
    final List<Path> day;
    final SpectrumChain chain;
    final Quantifier quantifier;
    final WorkspaceStore store;
    final Session analyst;
    final String projectId;
    final AnalysisVersions versions;

    /** @param method the method to fit with, made from the demo library */
    DemoBatchFixture(String prefix, Function<ReferenceLibrary, QuantificationMethod> method) throws Exception {
        folder = Files.createTempDirectory(prefix);
        Path raw = folder.resolve("raw");
        DemoPhysics physics = DemoPhysics.fromInventedLineLists(folder.resolve("line-lists"));
        DemoCampaignFiles.write(raw, physics, ProgressListener.NONE, new CancellationFlag());
        day = DemoCampaignFiles.stackFiles(raw);
        sixHours = day.subList(3, 9);
        hour = sixHours.get(0);
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
        QuantificationMethod fitted = method.apply(library);
        quantifier = new Quantifier(PreparedMethod.prepare(fitted, backgrounds.get(0).singleBeam().axis()),
                library.contentHash(), "bench", false);
        store = Workspaces.openH2(folder.resolve("db"));
        Session admin = store.users().createFirstAdministrator("admin", "Admin", "bench-admin-1".toCharArray());
        store.users().createUser(admin, "ana", "Analyst", Set.of(Role.ANALYST), "bench-ana-12".toCharArray());
        analyst = store.users().logIn("ana", "bench-ana-12".toCharArray());
        projectId = store.projects().createProject(analyst, store.projects().createClient(analyst, "Client").getId(),
                "B-1",
                "Benchmark").getId();
        ContentVersion met = store.versions().create(analyst, VersionKind.METHOD, fitted.name(), fitted.canonicalText(),
                "bench");
        ContentVersion lib = store.versions().create(analyst, VersionKind.LIBRARY, library.name(),
                "sha=" + library.contentHash() + "\n", "bench");
        versions = new AnalysisVersions(met.getId(), lib.getId());
    }

    /** Closes the workspace and deletes its folder: each fork's workspace grows to several GiB. */
    @Override
    public void close() {
        store.close();
        try (Stream<Path> files = Files.walk(folder)) {
            files.sorted(Comparator.reverseOrder()).forEach(f -> f.toFile().delete());
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
