package org.tracegas.campaign;

import java.io.IOException;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;

import org.tracegas.library.io.FileFormatException;
import org.tracegas.qa.checks.AbsorbanceRegion;
import org.tracegas.qa.checks.SpikeGas;

/**
 * What a campaign's QA measurements were made with, read from a QA plan file:
 *
 * <pre>
 * library = references/library.manifest   the method's library folder (for the CTS reference and its conditions)
 * cts-compound = CO                        gas of the calibration transfer standard
 * cts-ppm = 100                            its certified content, ppm
 * cts-band = 2040..2240                    band whose area gives the path length, cm-1
 * spike-analyte = HCl                      analyte of the spike gas
 * tracer = SF6                             tracer of the spike gas
 * spike-analyte-ppm = 60                   spike cylinder contents, ppm
 * spike-tracer-ppm = 2
 * analytes = CO, NO, N2O                   analytes checked on the zero gas
 * noise-region = 2450..2600                region of the noise check, cm-1
 * maximum-noise = 2e-3                     absorbance
 * background-age-limit = 24 h
 *
 * [chart]                                  (optional, repeatable) control charts of repeated readings
 * readings = Zero CO, Zero NO, Noise level readings charted, comma-separated, named as the checks are: "Zero "
 *                                          and an analyte of the zero gas, "Noise level", "CTS path length"
 * baseline = 8                             readings the centre line and sigma are set from (at least 2): the
 *                                          latest of earlier campaigns of the same method when there are
 *                                          that many, otherwise the first readings of this campaign
 * </pre>
 *
 * A reading is charted in one block at most; each chart adds the check "Control chart: " and the reading's
 * name, stored with the other checks.
 */
public record QaPlan(Path file, Path libraryManifest, String ctsCompound, double ctsPpm, double ctsLow,
        double ctsHigh, String spikeAnalyte, String tracer, SpikeGas spikeGas, List<String> analytes,
        AbsorbanceRegion noiseRegion, double maximumNoise, Duration backgroundAgeLimit,
        List<QaControlCharts> charts) {

    private static final Set<String> KEYS = Set.of("library", "cts-compound", "cts-ppm", "cts-band",
            "spike-analyte", "tracer", "spike-analyte-ppm", "spike-tracer-ppm", "analytes", "noise-region",
            "maximum-noise", "background-age-limit");

    public QaPlan {
        analytes = List.copyOf(analytes);
        charts = List.copyOf(charts);
    }

    /** @throws FileFormatException naming the file, line and key of the first error */
    public static QaPlan read(Path file) throws IOException {
        KeyValueFile f = KeyValueFile.read(file);
        f.allowBlocks(Set.of("chart"));
        KeyValueFile.Section h = f.head().allow(KEYS);
        double[] cts = h.value("cts-band").range();
        double[] noise = h.value("noise-region").range();
        for (String key : List.of("cts-ppm", "spike-analyte-ppm", "spike-tracer-ppm", "maximum-noise")) {
            if (!(h.number(key) > 0)) {
                throw h.error(key, "must be positive, was " + h.number(key));
            }
        }
        List<String> analytes = h.value("analytes").words();
        return new QaPlan(file, f.resolve(h.text("library")), h.text("cts-compound"), h.number("cts-ppm"), cts[0],
                cts[1], h.text("spike-analyte"), h.text("tracer"),
                new SpikeGas(h.number("spike-tracer-ppm"), h.number("spike-analyte-ppm")), analytes,
                new AbsorbanceRegion(noise[0], noise[1]), h.number("maximum-noise"),
                h.value("background-age-limit").duration(), charts(f, analytes));
    }

    /** The chart blocks; only readings the plan's checks repeat can be charted, each once. */
    private static List<QaControlCharts> charts(KeyValueFile f, List<String> analytes) throws FileFormatException {
        Set<String> repeated = new LinkedHashSet<>(List.of("CTS path length", "Noise level"));
        analytes.forEach(a -> repeated.add("Zero " + a));
        Set<String> charted = new HashSet<>();
        List<QaControlCharts> charts = new ArrayList<>();
        for (KeyValueFile.Section b : f.blocks("chart")) {
            b.allow(Set.of("readings", "baseline"));
            KeyValueFile.Value v = b.value("readings");
            List<String> readings = new ArrayList<>();
            for (String r : v.text().split(",")) {
                String reading = r.strip().replaceAll("\\s+", " ");
                if (!repeated.contains(reading)) {
                    throw v.error("'" + reading + "' is not a repeated reading of this plan; those are " + repeated);
                }
                if (!charted.add(reading)) {
                    throw v.error("'" + reading + "' is charted twice");
                }
                readings.add(reading);
            }
            int baseline = b.value("baseline").integer();
            if (baseline < 2) {
                throw b.error("baseline", "must be at least 2 readings, was " + baseline);
            }
            charts.add(new QaControlCharts(readings, baseline));
        }
        return charts;
    }
}
