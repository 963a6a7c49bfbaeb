package org.tracegas.qa.campaign;

import java.io.IOException;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.tracegas.library.io.FileFormatException;
import org.tracegas.method.KeyValueFile;
import org.tracegas.qa.checks.QaCheck;
import org.tracegas.qa.checks.QaCheckRegistry;
import org.tracegas.qa.checks.QaSettings;
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
 * checks = cts-path, cts-drift, zero-gas   (optional) the checks evaluated, in this order, by the names they are
 *                                          registered under (built in: cts-path, cts-drift, spike-recovery,
 *                                          zero-gas, method-detection-limit, background-age, which are the
 *                                          default); a contributed check
 *                                          may read keys of its own here
 *
 * [chart]                                  (optional, repeatable) control charts of repeated readings
 * readings = Zero CO, Zero NO, Noise level readings charted, comma-separated, named as the checks are: "Zero "
 *                                          and an analyte of the zero gas, "Noise level", "CTS path length"
 * baseline = 8                             readings the centre line and sigma are set from (at least 2): the
 *                                          latest of earlier campaigns of the same method when there are
 *                                          that many, otherwise the first readings of this campaign
 * stated-sigma = Zero NO 0.03 ppm, Zero HCl 0.05 ppm
 *                                          (optional) sigma of zero readings of this block, stated rather than
 *                                          estimated: such a reading is charted around 0 ppm, the zero gas's
 *                                          content, with that sigma, and every reading of the campaign is judged
 * sigma-source = QAL1 report 17-004, repeatability at zero
 *                                          where the stated sigma come from (required with stated-sigma); the
 *                                          chart's rule, stored with its check and printed in the report, names it
 * </pre>
 *
 * A reading is charted in one block at most; each chart adds the check "Control chart: " and the reading's
 * name, stored with the other checks. A stated sigma follows EN 14181:2014 QAL3, which sets the chart
 * parameters from S taken from QAL1 data (its table of contents); it suits a reading that drifts within the
 * analyser's stated performance, which limits from the day's first readings would flag.
 */
public record QaPlan(Path file, Path libraryManifest, String ctsCompound, double ctsPpm, double ctsLow,
        double ctsHigh, String spikeAnalyte, String tracer, SpikeGas spikeGas, List<String> analytes,
        AbsorbanceRegion noiseRegion, double maximumNoise, Duration backgroundAgeLimit,
        List<QaControlCharts> charts, List<QaCheck> checks, QaSettings settings) {

    private static final Set<String> KEYS = Set.of("library", "cts-compound", "cts-ppm", "cts-band",
            "spike-analyte", "tracer", "spike-analyte-ppm", "spike-tracer-ppm", "analytes", "noise-region",
            "maximum-noise", "background-age-limit", "checks");
    /** One stated sigma: the reading's name, a number and the unit ppm. */
    private static final Pattern STATED = Pattern.compile("(.+?)\\s+(\\S+)\\s+ppm");

    public QaPlan {
        analytes = List.copyOf(analytes);
        charts = List.copyOf(charts);
        checks = List.copyOf(checks);
    }

    /**
     * A plan whose checks are those {@link CampaignQaChecks#available()} knows.
     *
     * @throws FileFormatException naming the file, line and key of the first error
     */
    public static QaPlan read(Path file) throws IOException {
        return read(file, CampaignQaChecks.available());
    }

    /**
     * @param known the checks the plan may name
     * @throws FileFormatException naming the file, line and key of the first error; for a check no one
     *                             registered, the names of those that are
     */
    public static QaPlan read(Path file, QaCheckRegistry known) throws IOException {
        KeyValueFile f = KeyValueFile.read(file);
        f.allowBlocks(Set.of("chart"));
        KeyValueFile.Section h = f.head();
        List<QaCheck> checks = checks(h, known);
        Set<String> keys = new HashSet<>(KEYS);
        checks.forEach(c -> keys.addAll(c.settings()));
        h.allow(keys);
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
                h.value("background-age-limit").duration(), charts(f, analytes), checks, new PlanSettings(h));
    }

    /** The checks the plan names, or the built-in ones; each name must be registered, and named once. */
    private static List<QaCheck> checks(KeyValueFile.Section h, QaCheckRegistry known) throws FileFormatException {
        KeyValueFile.Value v = h.has("checks") ? h.value("checks") : null;
        List<String> names = v == null ? CampaignQaChecks.BUILT_IN : v.words();
        List<QaCheck> checks = new ArrayList<>();
        Set<String> named = new HashSet<>();
        for (String name : names) {
            QaCheck check = known.find(name).orElse(null);
            if (check == null) {
                String reason = "no QA check is named '" + name + "'; known checks are " + known.names();
                throw v != null ? v.error(reason) : h.error("checks", reason);
            }
            if (!named.add(name)) {
                throw v.error("'" + name + "' is named twice");
            }
            checks.add(check);
        }
        return checks;
    }

    /** The chart blocks; only readings the plan's checks repeat can be charted, each once. */
    private static List<QaControlCharts> charts(KeyValueFile f, List<String> analytes) throws FileFormatException {
        Set<String> repeated = new LinkedHashSet<>(List.of("CTS path length", "Noise level"));
        analytes.forEach(a -> repeated.add("Zero " + a));
        Set<String> charted = new HashSet<>();
        List<QaControlCharts> charts = new ArrayList<>();
        for (KeyValueFile.Section b : f.blocks("chart")) {
            b.allow(Set.of("readings", "baseline", "stated-sigma", "sigma-source"));
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
            Map<String, Double> stated = statedSigma(b, readings);
            if (!stated.isEmpty() && !b.has("sigma-source")) {
                throw b.error("sigma-source", "missing in the [chart] block of line " + b.line()
                        + ": a stated sigma needs its source");
            }
            if (stated.isEmpty() && b.has("sigma-source")) {
                throw b.error("sigma-source", "states the source of no sigma: stated-sigma is missing");
            }
            charts.add(new QaControlCharts(readings, baseline, stated, b.text("sigma-source", "")));
        }
        return charts;
    }

    /** The block's stated-sigma entries, "reading sigma ppm" each, for its zero readings only. */
    private static Map<String, Double> statedSigma(KeyValueFile.Section b, List<String> readings)
            throws FileFormatException {
        Map<String, Double> stated = new LinkedHashMap<>();
        if (!b.has("stated-sigma")) {
            return stated;
        }
        KeyValueFile.Value v = b.value("stated-sigma");
        for (String entry : v.text().split(",")) {
            Matcher m = STATED.matcher(entry.strip().replaceAll("\\s+", " "));
            if (!m.matches()) {
                throw v.error("'" + entry.strip() + "' is not 'reading sigma ppm', for example 'Zero NO 0.03 ppm'");
            }
            String reading = m.group(1);
            if (!readings.contains(reading) || !reading.startsWith("Zero ")) {
                throw v.error("'" + reading + "' is not a zero reading of this block; those are "
                        + readings.stream().filter(r -> r.startsWith("Zero ")).toList());
            }
            double sigma;
            try {
                sigma = Double.parseDouble(m.group(2));
            } catch (NumberFormatException e) {
                throw v.error("sigma '" + m.group(2) + "' of " + reading + " is not a number");
            }
            if (!(sigma > 0) || !Double.isFinite(sigma)) {
                throw v.error("sigma of " + reading + " must be positive, was " + m.group(2));
            }
            if (stated.put(reading, sigma) != null) {
                throw v.error("'" + reading + "' is stated twice");
            }
        }
        return stated;
    }
}
