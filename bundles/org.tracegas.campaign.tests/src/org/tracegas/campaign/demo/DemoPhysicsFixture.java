package org.tracegas.campaign.demo;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import java.util.Random;

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
                instance = new DemoPhysicsFixture(DemoPhysics.fromInventedLineLists(folder));
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        }
        return instance;
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
