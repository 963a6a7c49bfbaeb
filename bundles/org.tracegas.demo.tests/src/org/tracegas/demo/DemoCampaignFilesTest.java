package org.tracegas.demo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.time.Instant;
import java.util.List;
import java.util.Set;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.pipeline.ContainerContents;
import org.tracegas.pipeline.MeasurementRole;
import org.tracegas.qa.campaign.QaControlCharts;
import org.tracegas.qa.campaign.QaPlan;
import org.tracegas.importer.container.AcquisitionHeader;
import org.tracegas.importer.container.ContainerRecord;
import org.tracegas.preprocess.Background;
import org.tracegas.preprocess.InterferogramTransform;

/**
 * The demo day's QA file holds the repeated readings its QA plan charts: zero gas every 2 hours, the CTS every
 * 6 hours and after the last sample, a background every 6 hours (the schedule is the demo's own, invented).
 */
class DemoCampaignFilesTest {

    @TempDir
    Path folder;

    @Test
    void qaMeasurementsAreRepeatedThroughTheDayAsThePlanCharts() throws Exception {
        Path file = folder.resolve("qa.tgc");
        DemoCampaignFiles.writeQa(file, DemoPhysicsFixture.get().synthesizer());
        ContainerContents qa = ContainerContents.read(List.of(file), new InterferogramTransform(
                DemoMethod.transform()));
        Instant firstSample = DemoCampaignFiles.minuteTime(0);
        Instant lastSample = DemoCampaignFiles.minuteTime(DemoScenario.SAMPLES - 1);

        List<Instant> backgrounds = qa.backgrounds().stream().map(Background::measured).toList();
        assertEquals(4, backgrounds.size());
        assertTrue(backgrounds.get(0).isBefore(firstSample), "a background before the first sample");
        assertEquals(List.of(Duration.ofHours(6), Duration.ofHours(6), Duration.ofHours(6)), gaps(backgrounds));

        List<Instant> zeros = times(qa, MeasurementRole.ZERO);
        assertEquals(12, zeros.size());
        assertEquals(List.of(Duration.ofHours(2)), gaps(zeros).stream().distinct().toList(), "zero gas every 2 hours");
        List<Instant> cts = times(qa, MeasurementRole.CTS);
        assertEquals(5, cts.size(), "every 6 hours and once after the day");
        assertTrue(cts.get(0).isBefore(firstSample) && cts.get(4).isAfter(lastSample),
                "the drift is the first against the last, before and after the samples");
        assertEquals(List.of(Duration.ofHours(6), Duration.ofHours(6), Duration.ofHours(6)), gaps(cts.subList(0, 4)));
        assertEquals(3, times(qa, MeasurementRole.SPIKE).size());
        assertEquals(3, times(qa, MeasurementRole.UNSPIKED).size());
        List<Instant> all = qa.others().stream().map(r -> r.header().time()).toList();
        assertEquals(all.stream().sorted().toList(), all, "records in time order");

        Files.createDirectories(folder.resolve("library"));
        QaPlan plan = QaPlan.read(Files.writeString(folder.resolve("qa.plan"), DemoMethod.qaPlanText()));
        assertEquals(2, plan.charts().size());
        for (QaControlCharts chart : plan.charts()) {
            int readings = chart.readings().contains("CTS path length") ? cts.size() : zeros.size();
            // the first campaign sets the limits from its own first readings, and charts more than those
            assertTrue(readings > chart.baselineSize(), chart.readings() + ": " + readings + " readings");
        }
        assertEquals(8, plan.charts().get(0).baselineSize());
        assertEquals(3, plan.charts().get(1).baselineSize());
        // the zeros are charted with the demo instrument's stated sigma, its noise and path length from readings
        assertEquals(Set.of("Zero CO", "Zero NO", "Zero NH3", "Zero HCl"),
                plan.charts().get(0).statedSigma().keySet());
        assertTrue(plan.charts().get(0).sigmaSource().contains("the demo instrument's stated figures"),
                plan.charts().get(0).sigmaSource());
        assertTrue(plan.charts().get(1).statedSigma().isEmpty());
    }

    private static List<Instant> times(ContainerContents qa, String role) {
        return qa.others().stream().filter(r -> role.equals(r.header().extra().get(MeasurementRole.KEY)))
                .map(ContainerRecord::header).map(AcquisitionHeader::time).toList();
    }

    private static List<Duration> gaps(List<Instant> times) {
        return java.util.stream.IntStream.range(1, times.size())
                .mapToObj(i -> Duration.between(times.get(i - 1), times.get(i))).toList();
    }
}
