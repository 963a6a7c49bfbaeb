package org.tracegas.demo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.time.Duration;
import java.time.Instant;
import java.util.List;
import java.util.Map;
import java.util.Random;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.pipeline.ContainerContents;
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

    /**
     * Every sample of a background period is ratioed against the same background, so that background's noise
     * enters all of them alike and does not average out over the period. The tracer, absent from the stack gas,
     * must still read zero on average over the first period of the demo day within two standard deviations of
     * that shared noise, which one sample's standard uncertainty (a third of its detection limit: common
     * practice, no source) bounds from above; the spiked samples give the tracer and the analyte back at the
     * spike's dilution (within three detection limits, and 3 % for HCl as the first test allows).
     */
    @Test
    void tracerReadsZeroThroughABackgroundPeriodAndTheSpikeIsRecovered(@TempDir Path folder) throws Exception {
        Path qaFile = folder.resolve("qa.tgc");
        DemoCampaignFiles.writeQa(qaFile, synthesizer);
        List<Background> backgrounds = ContainerContents.read(List.of(qaFile), transform).backgrounds();
        Background first = backgrounds.get(0);
        ReferenceLibrary library = DemoMethod.library(physics, first.singleBeam().axis());
        Quantifier quantifier = new Quantifier(PreparedMethod.prepare(DemoMethod.method(library),
                first.singleBeam().axis()), library.contentHash(), "test", false);
        double sum = 0;
        double limits = 0;
        int n = 0;
        for (int minute = 0; minute < 330; minute += 30, n++) {
            // the stack sample of this minute as the demo day's files hold it
            CompoundResult sf6 = quantifier.quantify(Sample.of(absorbance(DayOfStackGas.at(minute),
                    DayOfStackGas.gain(minute), new Random(minute), first))).compound("SF6").orElseThrow();
            sum += sf6.concentration();
            limits += sf6.detectionLimit();
        }
        System.out.printf("SF6 over the first background period: mean %.5f ppm, mean detection limit %.5f ppm%n",
                sum / n, limits / n);
        assertTrue(Math.abs(sum / n) < 2 * limits / n / 3, "mean tracer " + sum / n + " ppm, detection limit "
                + limits / n);

        for (int i = 0; i < 3; i++) {
            int minute = 601 + 2 * i;
            Map<String, Double> spiked = DemoCampaignFiles.spiked(DayOfStackGas.at(minute));
            SpectrumResult result = quantifier.quantify(Sample.of(absorbance(spiked, DayOfStackGas.gain(minute),
                    new Random(100 + i), backgrounds.get(1))));
            CompoundResult sf6 = result.compound("SF6").orElseThrow();
            CompoundResult hcl = result.compound("HCl").orElseThrow();
            assertEquals(spiked.get("SF6"), sf6.concentration(), 3 * sf6.detectionLimit(), "spiked SF6");
            assertEquals(spiked.get("HCl"), hcl.concentration(), 0.03 * spiked.get("HCl"), "spiked HCl");
        }
    }

    private static Spectrum absorbance(Map<String, Double> ppm, double gain, Random random, Background against) {
        Spectrum sample = transform.singleBeam(synthesizer.synthesize(ppm, gain, DemoCampaignFiles.NOISE, random));
        return new BackgroundRatio().absorbance(sample, against.measured().plus(Duration.ofHours(1)), against)
                .spectrum();
    }
}
