package org.tracegas.demo;

import org.tracegas.report.campaign.WholeFile;
import java.io.IOException;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Random;
import java.util.concurrent.atomic.AtomicLong;
import java.util.stream.IntStream;

import org.tracegas.pipeline.MeasurementRole;
import org.tracegas.importer.container.AcquisitionHeader;
import org.tracegas.importer.container.ContainerWriter;
import org.tracegas.importer.container.SampleKind;
import org.tracegas.quantify.CancellationFlag;
import org.tracegas.quantify.ProgressListener;
import org.tracegas.spectrum.Interferogram;

/**
 * Writes the raw files of the demo day as the invented instrument and its neighbours would leave them: one
 * interferogram container per hour of stack gas, one container of the QA measurements (backgrounds and
 * calibration transfer standard every 6 hours and after the day, zero gas every 2 hours, spiked and unspiked
 * pairs), and the O2 analyzer's time-stamped CSV.
 */
public final class DemoCampaignFiles {

    /** Certified CO content of the calibration transfer standard cylinder, ppm (invented). */
    public static final double CTS_CO_PPM = 100.0;
    /** Analyte and tracer content of the spike cylinder, ppm (invented). */
    public static final double SPIKE_HCL_PPM = 60.0;
    public static final double SPIKE_SF6_PPM = 2.0;
    /** Fraction of spike gas in the spiked sample (invented; below 10 %: the spike flow rule). */
    static final double SPIKE_FRACTION = 0.09;
    /** Detector noise relative to the centre burst. */
    static final double NOISE = 4e-6;
    static final String QA_FILE = "qa-measurements.tgc";
    /** Backgrounds, CTS, zero gas and spike pairs in the QA file (see {@link #writeQa}). */
    private static final int QA_MEASUREMENTS = 4 + 5 + 12 + 6;
    public static final String SIDE_CHANNEL_FILE = "o2-analyzer.csv";

    private DemoCampaignFiles() {
    }

    /** The container files of the stack gas, in time order. */
    public static List<Path> stackFiles(Path folder) {
        List<Path> files = new ArrayList<>();
        for (int hour = 0; hour < 24; hour++) {
            files.add(folder.resolve(String.format(Locale.ROOT, "stack-%02d.tgc", hour)));
        }
        return files;
    }

    public static Path qaFile(Path folder) {
        return folder.resolve(QA_FILE);
    }

    /** Whether every file of the demo day is there (an earlier run wrote them). */
    public static boolean complete(Path folder) {
        return stackFiles(folder).stream().allMatch(Files::isRegularFile) && Files.isRegularFile(qaFile(folder))
                && Files.isRegularFile(folder.resolve(SIDE_CHANNEL_FILE));
    }

    /** Writes all files of the demo day into a folder; each file appears whole or not at all. */
    public static void write(Path folder, DemoPhysics physics, ProgressListener progress, CancellationFlag cancel)
            throws IOException {
        Files.createDirectories(folder);
        InterferogramSynthesizer synthesizer = physics.interferograms();
        long total = DemoScenario.SAMPLES + QA_MEASUREMENTS;
        AtomicLong done = new AtomicLong();
        writeQa(qaFile(folder), synthesizer);
        progress.progress(done.addAndGet(QA_MEASUREMENTS), total);
        List<Path> files = stackFiles(folder);
        for (int hour = 0; hour < 24 && !cancel.isCancelled(); hour++) {
            int first = hour * 60;
            Interferogram[] igms = new Interferogram[60];
            IntStream.range(0, 60).parallel().forEach(i -> {
                int minute = first + i;
                igms[i] = synthesizer.synthesize(DayOfStackGas.at(minute), DayOfStackGas.gain(minute), NOISE,
                        new Random(minute));
                progress.progress(done.incrementAndGet(), total);
            });
            try (ContainerWriter out = ContainerWriter.create(files.get(hour))) {
                for (int i = 0; i < 60; i++) {
                    out.append(header(SampleKind.SAMPLE, minuteTime(first + i), Map.of()), igms[i]);
                }
                out.commit();
            }
        }
        writeSideChannel(folder.resolve(SIDE_CHANNEL_FILE));
    }

    static Instant minuteTime(int minute) {
        return DemoScenario.DAY_START.plus(minute, ChronoUnit.MINUTES).plusSeconds(30);
    }

    private static AcquisitionHeader header(SampleKind kind, Instant time, Map<String, String> extra) {
        return new AcquisitionHeader(DemoScenario.interferogramPoints() / 2, kind, time, DemoScenario.CELL_TEMPERATURE,
                DemoScenario.CELL_PRESSURE * 10.0, DemoScenario.PATH_LENGTH, extra);
    }

    /**
     * The QA measurements as a lab repeats them through the day, so that the repeated readings can be charted:
     * a background every 6 hours, the CTS every 6 hours and once more after the last sample (its first and
     * last reading give the drift), zero gas every 2 hours, and the spiked and unspiked pairs at mid-morning.
     * Every measurement comes from the same synthesizer with the same detector noise as the stack gas.
     */
    static void writeQa(Path file, InterferogramSynthesizer synthesizer) throws IOException {
        Instant day = DemoScenario.DAY_START;
        Map<String, Double> nitrogen = Map.of();
        Map<String, Double> cts = Map.of("CO", CTS_CO_PPM);
        try (ContainerWriter out = ContainerWriter.create(file)) {
            Random random = new Random(-1);
            for (int hour = 0; hour < 24; hour += 2) {
                Instant slot = day.plus(hour, ChronoUnit.HOURS);
                if (hour % 6 == 0) {
                    out.append(header(SampleKind.BACKGROUND, slot.minusSeconds(1200), Map.of()),
                            synthesizer.synthesize(nitrogen, gain(hour), NOISE, random));
                    out.append(qaHeader(slot.minusSeconds(900), MeasurementRole.CTS),
                            synthesizer.synthesize(cts, gain(hour), NOISE, random));
                }
                out.append(qaHeader(slot.minusSeconds(600), MeasurementRole.ZERO),
                        synthesizer.synthesize(nitrogen, gain(hour), NOISE, random));
                if (hour == 10) {
                    for (int i = 0; i < 3; i++) {
                        int minute = 600 + 2 * i;
                        out.append(qaHeader(minuteTime(minute).minusSeconds(15), MeasurementRole.UNSPIKED),
                                synthesizer.synthesize(DayOfStackGas.at(minute), DayOfStackGas.gain(minute), NOISE,
                                        random));
                        out.append(qaHeader(minuteTime(minute + 1).minusSeconds(15), MeasurementRole.SPIKE),
                                synthesizer.synthesize(spiked(DayOfStackGas.at(minute + 1)),
                                        DayOfStackGas.gain(minute + 1), NOISE, random));
                    }
                }
            }
            out.append(qaHeader(day.plus(1, ChronoUnit.DAYS).plusSeconds(300), MeasurementRole.CTS),
                    synthesizer.synthesize(cts, gain(24), NOISE, random));
            out.commit();
        }
    }

    /** Gain of the source and detector for the QA gases, sagging by 0.5 % over the day (invented). */
    private static double gain(int hour) {
        return 1.0 - 0.005 * hour / 24.0;
    }

    private static AcquisitionHeader qaHeader(Instant time, String role) {
        return header(SampleKind.SAMPLE, time, Map.of(MeasurementRole.KEY, role));
    }

    /** Stack gas with the spike gas mixed in at the spike fraction. */
    static Map<String, Double> spiked(Map<String, Double> stack) {
        Map<String, Double> mix = new LinkedHashMap<>();
        stack.forEach((gas, ppm) -> mix.put(gas, (1 - SPIKE_FRACTION) * ppm));
        mix.merge("HCl", SPIKE_FRACTION * SPIKE_HCL_PPM, Double::sum);
        mix.put("SF6", SPIKE_FRACTION * SPIKE_SF6_PPM);
        return mix;
    }

    private static void writeSideChannel(Path file) throws IOException {
        WholeFile.write(file, stream -> {
            Writer out = new OutputStreamWriter(stream, StandardCharsets.UTF_8);
            out.write("time,O2,T_stack,p_stack\n");
            out.write("UTC,%vol,degC,kPa\n");
            for (int minute = 0; minute < DemoScenario.SAMPLES; minute++) {
                out.write(String.format(Locale.ROOT, "%s,%.3f,%.1f,%.2f%n", minuteTime(minute),
                        DayOfStackGas.oxygenPercent(minute), 142.0 + 6.0 * Math.sin(minute / 200.0),
                        99.8 + 0.2 * Math.sin(minute / 300.0)));
            }
            out.flush();
        });
    }
}
