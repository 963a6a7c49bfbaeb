package org.tracegas.campaign;

import java.io.IOException;
import java.nio.file.Path;
import java.time.Duration;
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
 * </pre>
 */
public record QaPlan(Path file, Path libraryManifest, String ctsCompound, double ctsPpm, double ctsLow,
        double ctsHigh, String spikeAnalyte, String tracer, SpikeGas spikeGas, List<String> analytes,
        AbsorbanceRegion noiseRegion, double maximumNoise, Duration backgroundAgeLimit) {

    private static final Set<String> KEYS = Set.of("library", "cts-compound", "cts-ppm", "cts-band",
            "spike-analyte", "tracer", "spike-analyte-ppm", "spike-tracer-ppm", "analytes", "noise-region",
            "maximum-noise", "background-age-limit");

    public QaPlan {
        analytes = List.copyOf(analytes);
    }

    /** @throws FileFormatException naming the file, line and key of the first error */
    public static QaPlan read(Path file) throws IOException {
        KeyValueFile f = KeyValueFile.read(file);
        f.allowBlocks(Set.of());
        KeyValueFile.Section h = f.head().allow(KEYS);
        double[] cts = h.value("cts-band").range();
        double[] noise = h.value("noise-region").range();
        for (String key : List.of("cts-ppm", "spike-analyte-ppm", "spike-tracer-ppm", "maximum-noise")) {
            if (!(h.number(key) > 0)) {
                throw h.error(key, "must be positive, was " + h.number(key));
            }
        }
        return new QaPlan(file, f.resolve(h.text("library")), h.text("cts-compound"), h.number("cts-ppm"), cts[0],
                cts[1], h.text("spike-analyte"), h.text("tracer"),
                new SpikeGas(h.number("spike-tracer-ppm"), h.number("spike-analyte-ppm")),
                h.value("analytes").words(), new AbsorbanceRegion(noise[0], noise[1]), h.number("maximum-noise"),
                h.value("background-age-limit").duration());
    }
}
