package org.tracegas.demo;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.Map;
import java.util.Random;
import java.util.stream.Stream;

import org.tracegas.library.ReferenceLibrary;
import org.tracegas.spectrum.Interferogram;
import org.tracegas.spectrum.SpectralAxis;

/** The demo instrument's physics, built once for all tests of this fragment (it takes seconds). */
public final class DemoPhysicsFixture {

    private static DemoPhysicsFixture instance;

    private final DemoPhysics physics;
    private final InterferogramSynthesizer synthesizer;

    private DemoPhysicsFixture(DemoPhysics physics) {
        this.physics = physics;
        this.synthesizer = physics.interferograms();
    }

    public static synchronized DemoPhysicsFixture get() {
        if (instance == null) {
            try {
                Path folder = Files.createTempDirectory("tracegas-line-lists");
                // the library synthesis reads the line lists again in every test class, so the folder lives as
                // long as the test JVM and goes with it
                Runtime.getRuntime().addShutdownHook(new Thread(() -> deleteTree(folder)));
                instance = new DemoPhysicsFixture(DemoPhysics.fromInventedLineLists(folder));
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        }
        return instance;
    }

    private static void deleteTree(Path folder) {
        try (Stream<Path> all = Files.walk(folder)) {
            all.sorted(Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
        } catch (IOException e) {
            // the JVM is ending; a folder in the temporary directory that could not go is left to the system
        }
    }

    DemoPhysics physics() {
        return physics;
    }

    InterferogramSynthesizer synthesizer() {
        return synthesizer;
    }

    public Interferogram interferogram(Map<String, Double> ppm, Random random) {
        return synthesizer.synthesize(ppm, 1.0, DemoCampaignFiles.NOISE, random);
    }

    public int zpd() {
        return DemoScenario.interferogramPoints() / 2;
    }

    public ReferenceLibrary library(SpectralAxis axis) {
        return DemoMethod.library(physics, axis);
    }
}
