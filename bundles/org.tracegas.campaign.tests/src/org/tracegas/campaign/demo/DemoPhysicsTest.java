package org.tracegas.campaign.demo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Duration;
import java.time.Instant;
import java.util.Map;
import java.util.Random;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.tracegas.library.ReferenceLibrary;
import org.tracegas.preprocess.Background;
import org.tracegas.preprocess.BackgroundRatio;
import org.tracegas.preprocess.InterferogramTransform;
import org.tracegas.quantify.CompoundResult;
import org.tracegas.quantify.PreparedMethod;
import org.tracegas.quantify.Quantifier;
import org.tracegas.quantify.Sample;
import org.tracegas.quantify.SpectrumResult;
import org.tracegas.spectrum.Spectrum;

/**
 * The demo's chain closes on itself: interferograms made line by line from known concentrations, transformed
 * and ratioed, then fitted against references synthesized by the library from the same line lists, give the
 * known concentrations back. This checks the transform, the instrument line shape of the references and the
 * fit together; a mismatch of conventions between them (resolution, apodization, axis) shows as a bias.
 */
class DemoPhysicsTest {

    private static DemoPhysics physics;
    private static InterferogramSynthesizer synthesizer;
    private static InterferogramTransform transform;
    private static Background background;

    @BeforeAll
    static void buildInstrument() throws Exception {
        physics = DemoPhysicsFixture.get().physics();
        synthesizer = DemoPhysicsFixture.get().synthesizer();
        transform = new InterferogramTransform(DemoMethod.transform());
        background = new Background("bg", Instant.EPOCH,
                transform.singleBeam(synthesizer.synthesize(Map.of(), 1.0, DemoCampaignFiles.NOISE, new Random(1))));
    }

    @Test
    void stackGasIsRecoveredFromItsInterferogram() {
        Map<String, Double> truth = DayOfStackGas.at(300);
        Spectrum sample = transform.singleBeam(synthesizer.synthesize(truth, 0.995, DemoCampaignFiles.NOISE,
                new Random(2)));
        Spectrum absorbance = new BackgroundRatio().absorbance(sample, Instant.EPOCH.plus(Duration.ofHours(1)),
                background).spectrum();
        ReferenceLibrary library = DemoMethod.library(physics, absorbance.axis());
        Quantifier quantifier = new Quantifier(PreparedMethod.prepare(DemoMethod.method(library), absorbance.axis()),
                library.contentHash(), "test", false);
        SpectrumResult result = quantifier.quantify(Sample.of(absorbance));
        for (Map.Entry<String, Double> gas : truth.entrySet()) {
            CompoundResult r = result.compound(gas.getKey()).orElseThrow();
            double tolerance = Math.max(0.03 * gas.getValue(), 3 * r.detectionLimit());
            System.out.printf("%-4s truth %10.3f fitted %10.3f u %.4f DL %.4f flags %s%n", gas.getKey(),
                    gas.getValue(), r.concentration(), r.standardUncertainty(), r.detectionLimit(), r.flags());
            assertEquals(gas.getValue(), r.concentration(), tolerance, gas.getKey());
            assertTrue(r.detectionLimit() < 0.05 * gas.getValue(), gas.getKey() + " detection limit " + r.detectionLimit());
        }
        CompoundResult sf6 = result.compound("SF6").orElseThrow();
        assertTrue(Math.abs(sf6.concentration()) < 3 * sf6.detectionLimit() + 0.005, "no tracer in stack gas: " + sf6);
    }
}
