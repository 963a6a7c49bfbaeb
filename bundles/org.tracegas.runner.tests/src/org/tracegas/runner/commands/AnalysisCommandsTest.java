package org.tracegas.runner.commands;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.tracegas.runner.commands.InventedBandSystem.TRANSFORM;
import static org.tracegas.runner.commands.InventedBandSystem.header;
import static org.tracegas.runner.commands.InventedBandSystem.methodFile;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Random;

import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.importer.container.ContainerWriter;
import org.tracegas.importer.container.SampleKind;
import org.tracegas.method.StoredMethod;
import org.tracegas.model.AccessLevel;
import org.tracegas.model.ContentVersion;
import org.tracegas.model.Instrument;
import org.tracegas.model.Measurement;
import org.tracegas.model.VersionKind;
import org.tracegas.pipeline.MeasurementRole;
import org.tracegas.quantify.CancellationFlag;
import org.tracegas.report.PdfReportWriter;
import org.tracegas.report.campaign.MinuteSeries;
import org.tracegas.runner.CommandTable;
import org.tracegas.runner.ExitCode;
import org.tracegas.runner.RunnerContext;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;
import org.tracegas.store.Workspaces;

/**
 * The analysis jobs from the command line on one real H2 workspace for the class, with a small invented band
 * system (CO-like, an N2O-like tracer and a few water-like lines near 2200 cm-1) at 7.7 cm-1: a library
 * synthesized from line lists, a method defined over it, three stack samples quantified with the stored method
 * version, the QA checks from a QA container (CTS before and after, zero gas, an unspiked and spiked pair) with a
 * control chart of the CTS readings, the report from stored data with an O2 side channel, its review signature,
 * and a later campaign charted against the first. The tests use their own projects or method names, so
 * they do not depend on each other's order. Malformed files are named with file, line and key and store nothing.
 */
class AnalysisCommandsTest {

    private static final Instant T0 = Instant.parse("2026-03-17T08:00:00Z");
    /** The stack samples, ppm: CO 20 at a reference amount, 60 and 120 half-way up a bracket of ratio 1.5. */
    private static final double[] CO_PPM = { 20, 60, 120 };
    private static final double H2O_PPM = 100_000;
    private static final double O2_WET = 9.0;
    private static final double CTS_PPM = 100;
    private static final double SPIKE_CO_PPM = 400;
    private static final double SPIKE_TRACER_PPM = 50;
    /** Spike flow share of the sample flow: inside the 10 % spike-flow limit, with room for measurement noise. */
    private static final double SPIKE_FRACTION = 0.08;

    @TempDir
    static Path folder;
    private static String ws;
    private static InventedBandSystem bands;
    private static Path qaFile;
    private static Path stackFile;

    private final ByteArrayOutputStream out = new ByteArrayOutputStream();
    private final ByteArrayOutputStream err = new ByteArrayOutputStream();

    private static final Map<String, String> ENV = Map.of("TRACEGAS_PASSWORD", "admin-pw-1",
            "TRACEGAS_NEW_PASSWORD", "admin-pw-1");

    private int run(String... argv) {
        return run(out, err, argv);
    }

    private static int run(ByteArrayOutputStream out, ByteArrayOutputStream err, String... argv) {
        CancellationFlag cancel = new CancellationFlag();
        CommandTable table = new CommandTable("test", List.of(new WorkspaceInitCommand(), new UserAddCommand(),
                new ProjectAddCommand(), new LibraryBuildCommand(cancel), new LibraryAddCommand(),
                new MethodDefineCommand(), new QuantifyCommand(cancel), new QaCommand(), new ReportCommand(),
                new ReportSignCommand(), new AuditVerifyCommand()));
        return table.dispatch(argv, new RunnerContext(new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8), ENV));
    }

    private static void ok(String... argv) {
        ByteArrayOutputStream o = new ByteArrayOutputStream();
        ByteArrayOutputStream e = new ByteArrayOutputStream();
        assertEquals(ExitCode.OK, run(o, e, argv), () -> String.join(" ", argv) + ": " + e + o);
    }

    private static Map<String, Double> stack(double co) {
        Map<String, Double> m = new LinkedHashMap<>();
        m.put("CO", co);
        m.put("H2O", H2O_PPM);
        return m;
    }

    /** The workspace, projects, raw files, library and method every test of the class starts from. */
    @BeforeAll
    static void workspaceLibraryAndMethod() throws Exception {
        ws = folder.resolve("ws").toString();
        ok("workspace-init", "--workspace", ws, "--admin", "root", "--name", "Admin");
        ok("user-add", "--workspace", ws, "--as", "root", "--login", "ana", "--name", "Ana Lyst", "--roles",
                "analyst");
        for (String code : List.of("P-1", "P-2", "P-3", "P-4", "P-5", "P-6", "P-7", "P-8", "P-9", "P-10")) {
            ok("project-add", "--workspace", ws, "--as", "ana", "--client", "Client " + code, "--code", code,
                    "--name", "Survey");
        }
        bands = new InventedBandSystem(folder);
        Random noise = new Random(17);
        qaFile = folder.resolve("qa.tgc");
        try (ContainerWriter w = ContainerWriter.create(qaFile)) {
            w.append(header(SampleKind.BACKGROUND, T0.minusSeconds(1200), null),
                    bands.interferogram(Map.of(), noise));
            w.append(header(SampleKind.SAMPLE, T0.minusSeconds(900), MeasurementRole.CTS),
                    bands.interferogram(Map.of("CO", CTS_PPM), noise));
            w.append(header(SampleKind.SAMPLE, T0.minusSeconds(720), MeasurementRole.ZERO),
                    bands.interferogram(Map.of(), noise));
            w.append(header(SampleKind.SAMPLE, T0.minusSeconds(540), MeasurementRole.UNSPIKED),
                    bands.interferogram(stack(CO_PPM[0]), noise));
            Map<String, Double> spiked = new LinkedHashMap<>();
            stack(CO_PPM[0]).forEach((g, c) -> spiked.put(g, (1 - SPIKE_FRACTION) * c));
            spiked.merge("CO", SPIKE_FRACTION * SPIKE_CO_PPM, Double::sum);
            spiked.put("N2O", SPIKE_FRACTION * SPIKE_TRACER_PPM);
            w.append(header(SampleKind.SAMPLE, T0.minusSeconds(480), MeasurementRole.SPIKE),
                    bands.interferogram(spiked, noise));
            w.append(header(SampleKind.SAMPLE, T0.plusSeconds(600), MeasurementRole.CTS),
                    bands.interferogram(Map.of("CO", CTS_PPM), noise));
            w.commit();
        }
        stackFile = folder.resolve("stack.tgc");
        try (ContainerWriter w = ContainerWriter.create(stackFile)) {
            for (int i = 0; i < CO_PPM.length; i++) {
                w.append(header(SampleKind.SAMPLE, T0.plusSeconds(60L * i), null),
                        bands.interferogram(stack(CO_PPM[i]), noise));
            }
            w.commit();
        }
        StringBuilder o2 = new StringBuilder("time,O2\nUTC,%vol\n");
        for (int i = 0; i < CO_PPM.length; i++) {
            o2.append(T0.plusSeconds(60L * i)).append(',').append(O2_WET).append('\n');
        }
        Files.writeString(folder.resolve("o2.csv"), o2);

        Path plan = bands.libraryPlan();
        ok("library-build", "--workspace", ws, "--as", "ana", "--plan", plan.toString(), "--out",
                folder.resolve("lib").toString());
        Files.writeString(folder.resolve("stack.method"), methodFile("Stack"));
        ok("method-define", "--workspace", ws, "--as", "ana", "--method", folder.resolve("stack.method").toString());
    }

    private static WorkspaceStore open() {
        return Workspaces.openH2(folder.resolve("ws").resolve("db"));
    }

    private static Session ana(WorkspaceStore store) {
        return store.users().logIn("ana", "admin-pw-1".toCharArray());
    }

    /**
     * The analyzer named on the command line is recorded once, with the figures the containers were written with
     * (the invented band system's reference laser and cell path), and every measurement quantified names it.
     */
    @Test
    void quantifyRecordsTheNamedInstrumentAndEveryMeasurementNamesIt() throws Exception {
        String[] where = { "--workspace", ws, "--as", "ana", "--project", "P-10", "--method", "Stack" };
        err.reset();
        assertEquals(ExitCode.USAGE, run(concat(where, "quantify", "--backgrounds", qaFile.toString(), "--file",
                stackFile.toString(), "--instrument", "Bench FTIR 3")), "a name without its serial number");
        assertTrue(err.toString(StandardCharsets.UTF_8).contains("--instrument-serial"), err.toString());
        ok(concat(where, "quantify", "--backgrounds", qaFile.toString(), "--file", stackFile.toString(),
                "--instrument", "Bench FTIR 3", "--instrument-serial", "QM-0311"));

        try (WorkspaceStore store = open()) {
            Session s = ana(store);
            Instrument bench = store.instruments().find(s, "Bench FTIR 3", "QM-0311").orElseThrow();
            assertEquals(InventedBandSystem.LASER, bench.getLaserWavenumber(), 0.0);
            assertEquals(InventedBandSystem.PATH, bench.getCellPathLength(), 0.0);
            assertTrue(bench.getMaxPathDifference() > 0, "maximum path difference " + bench.getMaxPathDifference());
            String project = store.projects().findByCode(s, "P-10").orElseThrow().getId();
            List<Measurement> measured = store.projects().measurements(s, project);
            assertTrue(measured.size() >= CO_PPM.length, measured.size() + " measurements");
            for (Measurement m : measured) {
                assertEquals(bench.getId(), m.getInstrument() == null ? null : m.getInstrument().getId(),
                        m.getKind() + " at " + m.getTime());
            }
            assertTrue(store.audit().verifyWorkspace(List.of()).intact());
        }
    }

    @Test
    void quantifyQaAndReportFromTheCommandLine() throws Exception {
        String[] where = { "--workspace", ws, "--as", "ana", "--project", "P-1", "--method", "Stack" };
        assertEquals(ExitCode.OK, run(concat(where, "quantify", "--backgrounds", qaFile.toString(), "--file",
                stackFile.toString())), err.toString());
        assertEquals(ExitCode.BAD_INPUT, run(concat(where, "quantify", "--backgrounds", qaFile.toString(), "--file",
                stackFile.toString())), "a second run would repeat the results");

        try (WorkspaceStore store = open()) {
            Session s = ana(store);
            ContentVersion version = store.versions().latest(VersionKind.METHOD, "Stack").orElseThrow();
            StoredMethod stored = StoredMethod.parse(store.versions().content(version.getId()), "test");
            assertEquals(64, version.getContentHash().length());
            String project = store.projects().findByCode(s, "P-1").orElseThrow().getId();
            MinuteSeries series = MinuteSeries.of(store.projects().measurements(s, project),
                    store.results().results(s, project), version.getId());
            assertEquals(stored.libraryVersionId(), series.libraryVersionId());
            assertEquals(CO_PPM.length, series.compound("CO").size());
            // sample 0 lies on a reference: the chain (transform, line shape, resolution, apodization, path)
            // closes to 0.1 % without noise, so 1 % leaves room for the noise only
            assertEquals(CO_PPM[0], series.compound("CO").get(0).ppm(), 0.01 * CO_PPM[0], "on a reference");
            for (int i = 1; i < CO_PPM.length; i++) {
                // between references a factor 1.5 apart the fit interpolates the absorptivity linearly in the
                // amount; even in the square-root regime of saturated lines (absorptivity ~ amount^-1/2: the
                // curve of growth of strong Lorentz lines, Goody and Yung, Atmospheric Radiation, from memory)
                // that reads at most 3.0 % low (worked out for a bracket of 1.5), so 4 % with the noise
                assertEquals(CO_PPM[i], series.compound("CO").get(i).ppm(), 0.04 * CO_PPM[i], "sample " + i);
            }
        }

        Path qaPlan = folder.resolve("qa.plan");
        Files.writeString(qaPlan, qaPlanText("lib/library.manifest"));
        out.reset();
        int qa = run(concat(where, "qa", "--plan", qaPlan.toString(), "--qa-file", qaFile.toString()));
        String printed = out.toString(StandardCharsets.UTF_8);
        assertEquals(ExitCode.OK, qa, printed + err);
        for (String check : List.of("pass ", "Spike recovery", "CTS", "Zero CO", "Noise", "Background age")) {
            assertTrue(printed.toLowerCase(Locale.ROOT).contains(check.toLowerCase(Locale.ROOT)), check + " in "
                    + printed);
        }
        // the campaign's two CTS readings set the chart's limits (baseline 2) and are not judged against them:
        // no chart in the first campaign; the later one is charted against them
        assertFalse(printed.contains("Control chart: CTS path length"), printed);
        assertFalse(printed.contains("stored earlier"), printed);
        int checks;
        try (WorkspaceStore store = open()) {
            checks = store.qa().checks(ana(store), store.projects().findByCode(ana(store), "P-1").orElseThrow().getId())
                    .size();
            assertTrue(checks >= 8, "CTS twice, drift, spike dilution and recovery, two zeros, noise, background age: "
                    + checks);
        }
        out.reset();
        assertEquals(ExitCode.OK, run(concat(where, "qa", "--plan", qaPlan.toString(), "--qa-file",
                qaFile.toString())));
        assertTrue(out.toString(StandardCharsets.UTF_8).contains("stored earlier"), "second run reuses the checks");

        Path reportPlan = folder.resolve("report.plan");
        Files.writeString(reportPlan, reportPlanText("o2.csv"));
        Path report = folder.resolve("report-P-1");
        out.reset();
        assertEquals(ExitCode.OK, run(concat(where, "report", "--plan", reportPlan.toString(), "--out",
                report.toString())), err.toString());
        String hash = printed("Content hash (SHA-256): ");
        assertEquals(64, hash.length(), out.toString());
        assertEquals("R-TEST-1", printed("Report id: "));
        assertFalse(out.toString(StandardCharsets.UTF_8).contains("Signature:"), "not signed yet");
        String text = pdfText(report);
        assertTrue(text.contains("R-TEST-1"), "report id");
        assertTrue(text.contains(hash), "the content hash printed is the report's");
        assertTrue(text.contains("Test plant"), "plant of the campaign");
        assertTrue(text.contains("Stack") && text.contains("v1"), "method and its version");
        String caution = PdfReportWriter.STANDARD_CAUTIONS.get(0);
        assertTrue(text.contains(caution.substring(0, Math.min(40, caution.length()))), "the standard caution");
        List<String> csv = Files.readAllLines(report.resolve("results.csv"), StandardCharsets.UTF_8);
        String row = csv.stream().filter(l -> l.startsWith("CO,") && l.contains("3 min")).findFirst()
                .orElseThrow(() -> new AssertionError("no 3-min CO row in " + csv));
        double mean = Double.parseDouble(row.split(",")[3]);
        // mg/m³ = ppm · M / Vm with Vm = R T / p = 22.419 L/mol at 273.15 K and 101.3 kPa (ideal gas, CODATA R),
        // dry: / (1 - H2O), at 11 % O2: · (21 - 11) / (21 - O2 dry) (EN 15259 / EN 14181 practice, from memory)
        double ppm = (CO_PPM[0] + CO_PPM[1] + CO_PPM[2]) / 3;
        double h2o = H2O_PPM / 1e6;
        double expected = ppm * 28.010 / (8.314462618 * 273.15 / 101.3) / (1 - h2o) * (21 - 11)
                / (21 - O2_WET / (1 - h2o));
        // the CO readings hold within 4 % (above) and the water reading enters as 1 / (1 - H2O)
        assertEquals(expected, mean, 0.05 * expected, row);

        signedByAnotherUserOnly(where, reportPlan, report, hash);
        laterCampaignIsChartedAgainstThisOne(qaPlan, reportPlan);
        assertTrue(text.contains("Made under: Verified: audit chain of"), "the verification the report was made under");
        refusedAfterTampering(where, reportPlan, text);
    }

    /**
     * A campaign whose QA file repeats zero gas 8 times: each analyte of the zero gas gets its method detection
     * limit and minimum analyte uncertainty as stored QA checks, the report states them in a table, and N2O, absent
     * from the stack, is shown below its MDL in the report while the export keeps its value.
     */
    @Test
    void replicateZeroReadingsGiveMethodDetectionLimitsThatTheReportStates() throws Exception {
        int zeros = 8;
        Random noise = new Random(29);
        Path qa = folder.resolve("qa-zeros.tgc");
        try (ContainerWriter w = ContainerWriter.create(qa)) {
            w.append(header(SampleKind.BACKGROUND, T0.minusSeconds(3600), null), bands.interferogram(Map.of(), noise));
            w.append(header(SampleKind.SAMPLE, T0.minusSeconds(3000), MeasurementRole.CTS),
                    bands.interferogram(Map.of("CO", CTS_PPM), noise));
            for (int i = 0; i < zeros; i++) {
                w.append(header(SampleKind.SAMPLE, T0.minusSeconds(2400 - 240L * i), MeasurementRole.ZERO),
                        bands.interferogram(Map.of(), noise));
            }
            w.commit();
        }
        // a method of its own, so that these zero readings are no history of the other campaigns' charts
        Path method = folder.resolve("zeros.method");
        Files.writeString(method, methodFile("Zeros"));
        ok("method-define", "--workspace", ws, "--as", "ana", "--method", method.toString());
        Path qaPlan = folder.resolve("qa-zeros.plan");
        String plan = qaPlanText("lib/library.manifest");
        Files.writeString(qaPlan, plan.substring(0, plan.indexOf("[chart]")));
        String[] where = { "--workspace", ws, "--as", "ana", "--project", "P-7", "--method", "Zeros" };
        ok(concat(where, "quantify", "--backgrounds", qa.toString(), "--file", stackFile.toString()));
        ok(concat(where, "qa", "--plan", qaPlan.toString(), "--qa-file", qa.toString()));
        List<org.tracegas.qa.checks.MethodDetectionLimit> limits;
        try (WorkspaceStore store = open()) {
            Session s = ana(store);
            String project = store.projects().findByCode(s, "P-7").orElseThrow().getId();
            ContentVersion version = store.versions().latest(VersionKind.METHOD, "Zeros").orElseThrow();
            limits = org.tracegas.qa.checks.MethodDetectionLimit.fromOutcomes(
                    org.tracegas.qa.campaign.StoredQaChecks.load(store, s, project, version.getId()));
        }
        assertEquals(List.of("CO", "N2O"), limits.stream().map(l -> l.analyte()).toList());
        for (var l : limits) {
            assertEquals(zeros, l.readings(), l.toString());
            // t(7, 0.99) = 2.998 (40 CFR Part 136 Appendix B table, as reproduced in Wis. Adm. Code NR 252.0365)
            assertEquals(2.998, l.t(), 0.0005, l.toString());
            // S of 8 results of white noise lies within sigma sqrt(chi2(7)/7) for chi2(7) between its 0.1 % and
            // 99.9 % points 0.598 and 24.32 (chi-square table, from memory): the fit's noise-limited sigma (MAU / 3)
            // must account for the scatter the chain leaves in repeated zero readings
            double ratio = l.standardDeviation() / (l.minimumAnalyteUncertainty() / 3);
            assertTrue(ratio > Math.sqrt(0.598 / 7) && ratio < Math.sqrt(24.32 / 7), l + ": S / sigma " + ratio);
        }

        Path reportPlan = folder.resolve("report-zeros.plan");
        Files.writeString(reportPlan, reportPlanText("o2.csv").replace("qa-plan = qa.plan", "qa-plan = qa-zeros.plan")
                .replace("R-TEST-1", "R-TEST-7") + "\n[compound]\nname = N2O\nmolar-mass = 44.013\n");
        Path report = folder.resolve("report-P-7");
        ok(concat(where, "report", "--plan", reportPlan.toString(), "--out", report.toString()));
        String text = pdfText(report);
        assertTrue(text.contains("Method detection limits"), "the table's heading");
        assertTrue(text.contains("t(n-1, 0.99) x S"), "the formula stated");
        assertTrue(text.contains(PdfReportWriter.BELOW_MDL_CONVENTION.substring(0, 60)), "the convention stated");
        List<String> csv = Files.readAllLines(report.resolve("results.csv"), StandardCharsets.UTF_8);
        String n2o = csv.stream().filter(l -> l.startsWith("N2O,")).findFirst().orElseThrow(() -> new AssertionError(
                "no N2O row in " + csv));
        assertTrue(n2o.contains("< MDL"), "no N2O in the stack: below its MDL: " + n2o);
        Double.parseDouble(n2o.split(",")[3]); // the value is kept in the export
        assertTrue(text.contains("N2O 3 min"), text);
        String co = csv.stream().filter(l -> l.startsWith("CO,")).findFirst().orElseThrow();
        assertFalse(co.contains("< MDL"), "CO at 20 to 120 ppm is far above its MDL: " + co);
    }

    /**
     * A method whose path source is the CTS: the campaign's CTS readings were made with 3 % more CTS gas in the
     * cell than the QA plan states, which by Beer-Lambert (absorbance proportional to concentration times path)
     * has the absorbance of a path 3 % longer than the nominal. Every result is then the nominal path over the
     * path the CTS band gives times what the same method with the nominal path gives on the same spectra, its
     * stored conditions name the CTS-derived path, and so does the report.
     */
    @Test
    void ctsDerivedPathCorrectsEveryResultAndTheReportNamesIt() throws Exception {
        double longer = 1.03;
        double ctsPath;
        Random noise = new Random(31);
        Path qa = folder.resolve("qa-cts.tgc");
        try (ContainerWriter w = ContainerWriter.create(qa)) {
            w.append(header(SampleKind.BACKGROUND, T0.minusSeconds(3600), null), bands.interferogram(Map.of(), noise));
            w.append(header(SampleKind.SAMPLE, T0.minusSeconds(3000), MeasurementRole.CTS),
                    bands.interferogram(Map.of("CO", longer * CTS_PPM), noise));
            w.append(header(SampleKind.SAMPLE, T0.plusSeconds(600), MeasurementRole.CTS),
                    bands.interferogram(Map.of("CO", longer * CTS_PPM), noise));
            w.commit();
        }
        Path qaPlan = folder.resolve("qa-cts.plan");
        String plan = qaPlanText("lib/library.manifest");
        Files.writeString(qaPlan, plan.substring(0, plan.indexOf("[chart]")));
        Path nominal = folder.resolve("cts-nominal.method");
        Files.writeString(nominal, methodFile("Nominal path"));
        ok("method-define", "--workspace", ws, "--as", "ana", "--method", nominal.toString());
        Path derived = folder.resolve("cts-derived.method");
        Files.writeString(derived, methodFile("CTS path").replace("path-length = 4.85\n",
                "path-length = 4.85\npath-source = cts-derived\n"));
        ok("method-define", "--workspace", ws, "--as", "ana", "--method", derived.toString());

        String[] cts = { "--workspace", ws, "--as", "ana", "--project", "P-8", "--method", "CTS path" };
        err.reset();
        assertEquals(ExitCode.BAD_INPUT, run(concat(cts, "quantify", "--backgrounds", qa.toString(), "--file",
                stackFile.toString())), "the CTS path needs the QA plan");
        assertTrue(err.toString(StandardCharsets.UTF_8).contains("--qa-plan"), err.toString());
        ok(concat(cts, "quantify", "--backgrounds", qa.toString(), "--file", stackFile.toString(), "--qa-plan",
                qaPlan.toString()));
        ok("quantify", "--workspace", ws, "--as", "ana", "--project", "P-9", "--method", "Nominal path",
                "--backgrounds", qa.toString(), "--file", stackFile.toString());
        ok(concat(cts, "qa", "--plan", qaPlan.toString(), "--qa-file", qa.toString()));
        try (WorkspaceStore store = open()) {
            Session s = ana(store);
            List<MinuteSeries.Point> fromCts = co(store, s, "P-8", "CTS path");
            List<MinuteSeries.Point> fromNominal = co(store, s, "P-9", "Nominal path");
            assertEquals(CO_PPM.length, fromCts.size());
            double path = fromCts.get(0).conditions().pathM();
            ctsPath = path;
            // 3 % more CO on the path is, to Beer-Lambert, the absorbance of a 3 % longer path; the band area
            // L_s = L_r (A_s/A_r)(C_r/C_s) reads less than that, as the strong CO lines at 7.7 cm-1 saturate and
            // their band grows slower than the amount (curve of growth, Goody and Yung, from memory): here 2.1 %.
            // The path is the band's, as the CTS check measured it: between 1.5 and 3 % over the nominal
            assertTrue(path > 1.015 * 4.85 && path <= longer * 4.85, "CTS path " + path);
            assertEquals(path, ctsCheckPath(store, s, "P-8"), 1e-9 * path, "the path the CTS check measured");
            for (int i = 0; i < CO_PPM.length; i++) {
                MinuteSeries.Point c = fromCts.get(i);
                assertEquals("cts-derived", c.conditions().pathOrigin());
                assertEquals("nominal", fromNominal.get(i).conditions().pathOrigin());
                // C_corr = (L_r/L_s)... C_calc (EPA FTIR Protocol 11.2): the same fit, L_s the CTS path
                assertEquals(fromNominal.get(i).ppm() * 4.85 / path, c.ppm(), 1e-9 * c.ppm(), "sample " + i);
            }
        }
        Path reportPlan = folder.resolve("report-cts.plan");
        Files.writeString(reportPlan, reportPlanText("o2.csv").replace("qa-plan = qa.plan", "qa-plan = qa-cts.plan")
                .replace("R-TEST-1", "R-TEST-8"));
        Path report = folder.resolve("report-P-8");
        ok(concat(cts, "report", "--plan", reportPlan.toString(), "--out", report.toString()));
        String text = pdfText(report);
        assertTrue(text.contains("path cts-derived"), "the report names the path's source: " + text);
        // the budget is at the path the results were corrected to (4 significant digits, as the report prints)
        String budgetPath = new java.math.BigDecimal(ctsPath).round(new java.math.MathContext(4)).stripTrailingZeros()
                .toPlainString();
        assertTrue(text.contains("path length " + budgetPath + " 0.05 m"), "the budget's path " + budgetPath);
    }

    /** The mean of the stored CTS path length checks of a project. */
    private static double ctsCheckPath(WorkspaceStore store, Session s, String code) {
        String project = store.projects().findByCode(s, code).orElseThrow().getId();
        return store.qa().checks(s, project).stream().filter(c -> c.getCheck().equals("CTS path length"))
                .mapToDouble(c -> c.getMeasured()).average().orElseThrow();
    }

    private static List<MinuteSeries.Point> co(WorkspaceStore store, Session s, String code, String method) {
        String project = store.projects().findByCode(s, code).orElseThrow().getId();
        ContentVersion version = store.versions().latest(VersionKind.METHOD, method).orElseThrow();
        return MinuteSeries.of(store.projects().measurements(s, project), store.results().results(s, project),
                version.getId()).compound("CO");
    }

    /**
     * Every stored result halved through H2's own connection, outside the store: a report is refused naming the
     * rows, audit-verify names them, and the anchor printed on the earlier report still passes after the numbers
     * are put back.
     */
    private void refusedAfterTampering(String[] where, Path reportPlan, String earlierReportText) throws Exception {
        java.util.regex.Matcher anchor = java.util.regex.Pattern.compile("audit-verify --anchor (\\d+:[0-9a-f]{64})")
                .matcher(earlierReportText);
        assertTrue(anchor.find(), "the report prints its anchor");
        halveResults(0.5);
        try {
            assertEquals(ExitCode.CHECK_FAILED, run(concat(where, "report", "--plan", reportPlan.toString(), "--out",
                    folder.resolve("report-after-tampering").toString())));
            String refusal = err.toString(StandardCharsets.UTF_8);
            assertTrue(refusal.contains("refusing to make the report") && refusal.contains("CHANGED result "),
                    refusal);
            assertFalse(Files.exists(folder.resolve("report-after-tampering").resolve("report.pdf")), "no report");
            assertEquals(ExitCode.CHECK_FAILED, run("audit-verify", "--workspace", ws, "--anchor", anchor.group(1)));
            assertTrue(out.toString(StandardCharsets.UTF_8).contains("CHANGED result "), out.toString());
        } finally {
            halveResults(2); // exact in binary floating point: the stored numbers are as before
        }
        assertEquals(ExitCode.OK, run("audit-verify", "--workspace", ws, "--anchor", anchor.group(1)), out.toString());
    }

    private static void halveResults(double factor) throws Exception {
        org.h2.Driver.load();
        try (java.sql.Connection c = java.sql.DriverManager.getConnection("jdbc:h2:file:"
                + Path.of(ws).resolve("db").resolve("workspace")); java.sql.Statement s = c.createStatement()) {
            s.executeUpdate("UPDATE analysis_result SET concentration = concentration * " + factor);
        }
    }

    /**
     * A later campaign of the same method: its CTS readings are charted with limits from this campaign's, and a
     * report drawn with another baseline than the checks were evaluated with is refused, naming the QA plan.
     */
    private void laterCampaignIsChartedAgainstThisOne(Path qaPlan, Path reportPlan) throws Exception {
        String[] where = { "--workspace", ws, "--as", "ana", "--project", "P-4", "--method", "Stack" };
        ok(concat(where, "quantify", "--backgrounds", qaFile.toString(), "--file", stackFile.toString()));
        // a noise limit far below the noise of the spectra: the noise check of this campaign fails
        Path strictPlan = folder.resolve("strict-qa.plan");
        Files.writeString(strictPlan, Files.readString(qaPlan).replace("maximum-noise = 2e-3",
                "maximum-noise = 1e-9"));
        assertEquals(ExitCode.CHECK_FAILED, run(concat(where, "qa", "--plan", strictPlan.toString(), "--qa-file",
                qaFile.toString())));
        try (WorkspaceStore store = open()) {
            String project = store.projects().findByCode(ana(store), "P-4").orElseThrow().getId();
            String rule = store.qa().checks(ana(store), project).stream()
                    .filter(c -> c.getCheck().equals("Control chart: CTS path length")).findFirst()
                    .orElseThrow().getRule();
            assertTrue(rule.contains("the latest 2 readings of earlier campaigns"), rule);
        }
        Path report = folder.resolve("report-P-4");
        // R-TEST-1 is signed on P-1: the same id on another project would make its signatures ambiguous
        err.reset();
        assertEquals(ExitCode.BAD_INPUT, run(concat(where, "report", "--plan", reportPlan.toString(), "--out",
                report.toString())));
        assertTrue(err.toString(StandardCharsets.UTF_8).contains("report id R-TEST-1 is issued or signed already on project "
                + "P-1"), err.toString());
        assertFalse(Files.exists(report.resolve("report.pdf")), "nothing written");
        Path laterPlan = folder.resolve("later-report.plan");
        Files.writeString(laterPlan, reportPlanText("o2.csv").replace("report-id = R-TEST-1", "report-id = R-TEST-4"));
        reportPlan = laterPlan;
        out.reset();
        assertEquals(ExitCode.CHECK_FAILED, run(concat(where, "report", "--plan", reportPlan.toString(), "--out",
                report.toString())), "written, but a QA reading failed: " + err);
        assertTrue(out.toString(StandardCharsets.UTF_8).contains("QA readings failed"), out.toString());
        String laterText = pdfText(report);
        assertTrue(laterText.contains("QA readings FAILED"), "the first page says so");
        assertTrue(laterText.contains("(limits from earlier campaigns)"), "history set the limits");
        assertTrue(laterText.contains("CTS path length, readings of this campaign"), "the chart drawn from stored "
                + "checks");

        Path otherBaseline = folder.resolve("other-baseline.plan");
        Files.writeString(otherBaseline, qaPlanText("lib/library.manifest").replace("baseline = 2", "baseline = 3"));
        Path otherReportPlan = folder.resolve("other-report.plan");
        Files.writeString(otherReportPlan, Files.readString(reportPlan).replace("qa-plan = qa.plan",
                "qa-plan = other-baseline.plan"));
        err.reset();
        assertEquals(ExitCode.BAD_INPUT, run(concat(where, "report", "--plan", otherReportPlan.toString(), "--out",
                folder.resolve("report-P-4-other").toString())));
        String message = err.toString(StandardCharsets.UTF_8);
        assertTrue(message.contains("other-baseline.plan") && message.contains("[chart]"), message);
    }

    /** The report's review: never by its analyst, only on the content read, then printed with the report. */
    private void signedByAnotherUserOnly(String[] where, Path reportPlan, Path report, String hash)
            throws Exception {
        String[] sign = { "--plan", reportPlan.toString(), "--report", "R-TEST-1", "--meaning", "reviewed" };
        err.reset();
        assertEquals(ExitCode.CHECK_FAILED, run(plus(concat(where, "report-sign", sign), "--content-hash",
                hash)), "the analyst who recorded the results reviews her own report");
        assertTrue(err.toString(StandardCharsets.UTF_8).contains("refused"), err.toString());

        ok("user-add", "--workspace", ws, "--as", "root", "--login", "rev", "--name", "Rhea Viewer", "--roles",
                "reviewer");
        try (WorkspaceStore store = open()) {
            Session ana = ana(store);
            store.projects().grant(ana, store.projects().findByCode(ana, "P-1").orElseThrow().getId(),
                    store.users().logIn("rev", "admin-pw-1".toCharArray()).userId(), AccessLevel.READ);
        }
        String[] asReviewer = where.clone();
        asReviewer[3] = "rev";
        String other = hash.substring(0, 63) + (hash.endsWith("0") ? "1" : "0");
        err.reset();
        assertEquals(ExitCode.BAD_INPUT, run(plus(concat(asReviewer, "report-sign", sign), "--content-hash",
                other)), "a content other than the one the stored data give");
        assertTrue(err.toString(StandardCharsets.UTF_8).contains(hash), err.toString());
        err.reset();
        String[] otherReport = sign.clone();
        otherReport[3] = "R-TEST-2";
        assertEquals(ExitCode.BAD_INPUT, run(plus(concat(asReviewer, "report-sign", otherReport),
                "--content-hash", hash)));
        assertTrue(err.toString(StandardCharsets.UTF_8).contains("R-TEST-2"), err.toString());

        out.reset();
        assertEquals(ExitCode.OK, run(plus(concat(asReviewer, "report-sign", sign), "--content-hash",
                hash.toUpperCase(Locale.ROOT), "--comment", "checked against the raw files")), err.toString());
        assertTrue(out.toString(StandardCharsets.UTF_8).contains("REVIEWED by Rhea Viewer"), out.toString());
        assertTrue(printed("Chain anchor: ").matches("\\d+:[0-9a-f]{64}"), "the signer keeps the chain anchor");

        out.reset();
        assertEquals(ExitCode.OK, run(concat(where, "report", "--plan", reportPlan.toString(), "--out",
                report.toString())), err.toString());
        assertEquals(hash, printed("Content hash (SHA-256): "), "signatures are not part of the content");
        assertTrue(printed("Signature: ").startsWith("REVIEW by Rhea Viewer at "), out.toString());
        assertFalse(printed("Signature: ").contains("earlier content"), out.toString());
        String text = pdfText(report);
        assertTrue(text.contains("Rhea Viewer"), "the signature is on the report made again");
    }

    /** The rest of the line the last command printed after a label. */
    private String printed(String label) {
        return out.toString(StandardCharsets.UTF_8).lines().filter(l -> l.startsWith(label))
                .map(l -> l.substring(label.length())).findFirst()
                .orElseThrow(() -> new AssertionError("no '" + label + "' in " + out));
    }

    private static String pdfText(Path report) throws IOException {
        try (PDDocument doc = Loader.loadPDF(report.resolve("report.pdf").toFile())) {
            return new PDFTextStripper().getText(doc).replaceAll("\\s+", " ");
        }
    }

    private static String[] plus(String[] first, String... more) {
        String[] all = new String[first.length + more.length];
        System.arraycopy(first, 0, all, 0, first.length);
        System.arraycopy(more, 0, all, first.length, more.length);
        return all;
    }

    /**
     * The containers of the stack path, imported as the lab's files (no --backgrounds: the background record
     * serves as a background measurement), give the stack path's concentrations: one chain of transform, ratio
     * and fit, whichever way the interferograms come in; and both recover the amounts the interferograms were
     * made with (the tolerance of {@link #quantifyQaAndReportFromTheCommandLine}).
     */
    @Test
    void containersImportedAsMeasurementsGiveTheStackPathsConcentrations() throws Exception {
        ok("quantify", "--workspace", ws, "--as", "ana", "--project", "P-5", "--method", "Stack", "--backgrounds",
                qaFile.toString(), "--file", stackFile.toString());
        ok("quantify", "--workspace", ws, "--as", "ana", "--project", "P-6", "--method", "Stack",
                "--background-file", qaFile.toString(), "--file", stackFile.toString());
        try (WorkspaceStore store = open()) {
            Session s = ana(store);
            String stack = store.projects().findByCode(s, "P-5").orElseThrow().getId();
            Map<Instant, Double> byStackPath = new java.util.HashMap<>();
            Map<String, Instant> times = new java.util.HashMap<>();
            store.projects().measurements(s, stack).forEach(m -> times.put(m.getId(), m.getTime()));
            for (var r : store.results().results(s, stack)) {
                if (r.getCompound().equals("CO")) {
                    byStackPath.put(times.get(r.getMeasurementId()), r.getConcentration());
                }
            }
            String imported = store.projects().findByCode(s, "P-6").orElseThrow().getId();
            int compared = 0;
            for (var row : store.analyses().rows(s, imported)) {
                Double stackValue = byStackPath.get(row.measured());
                if (stackValue == null || !row.result().getCompound().equals("CO")) {
                    continue; // the QA records of the file were quantified as samples too
                }
                int i = (int) java.time.Duration.between(T0, row.measured()).toSeconds() / 60;
                assertEquals(stackValue, row.result().getConcentration(), 1e-6 * stackValue,
                        "sample " + i + ": the same chain");
                assertEquals(CO_PPM[i], row.result().getConcentration(), 0.04 * CO_PPM[i], "sample " + i);
                assertTrue(store.analyses().recipe(s, row.recipeSha256()).contains("transform settings="),
                        "the recipe names the transform");
                compared++;
            }
            assertEquals(CO_PPM.length, compared);
        }
    }

    private static String[] concat(String[] where, String command, String... more) {
        String[] all = new String[1 + where.length + more.length];
        all[0] = command;
        System.arraycopy(where, 0, all, 1, where.length);
        System.arraycopy(more, 0, all, 1 + where.length, more.length);
        return all;
    }

    private static String qaPlanText(String library) {
        return String.format(Locale.ROOT, """
                library = %s
                cts-compound = CO
                cts-ppm = %s
                cts-band = 2050..2200
                spike-analyte = CO
                tracer = N2O
                spike-analyte-ppm = %s
                spike-tracer-ppm = %s
                analytes = CO, N2O
                noise-region = 2285..2298
                maximum-noise = 2e-3
                background-age-limit = 24 h

                [chart]
                readings = CTS path length, Zero CO
                baseline = 2
                """, library, CTS_PPM, SPIKE_CO_PPM, SPIKE_TRACER_PPM);
    }

    private static String reportPlanText(String o2File) {
        return """
                report-id = R-TEST-1
                client = C
                plant = Test plant
                source = Stack 1
                first-day = 2026-03-17
                last-day = 2026-03-17
                issued = 2026-03-19T00:00:00Z
                standard-temperature = 273.15
                standard-pressure = 101.3
                reference-o2 = 11
                o2-guard = 20
                o2-file = %s
                o2-channel = O2
                o2-uncertainty = 0.2
                water = H2O
                cell-temperature = 438.15
                cell-pressure = 101.3
                reference-uncertainty = 0.02
                path-uncertainty = 0.05
                temperature-uncertainty = 2
                pressure-uncertainty = 0.5
                periods = 3 min
                example-fit = 2026-03-17T08:00:00Z CO
                qa-plan = qa.plan

                [compound]
                name = CO
                molar-mass = 28.010
                limit = 100 per 3 min
                """.formatted(o2File);
    }

    @Test
    void malformedQaAndReportPlansAreNamedByLineAndKeyAndStoreNothing() throws Exception {
        String[] where = { "--workspace", ws, "--as", "ana", "--project", "P-2", "--method", "Stack" };
        Path qaPlan = folder.resolve("bad-qa.plan");
        Files.writeString(qaPlan, qaPlanText("lib/library.manifest").replace("cts-ppm = 100.0", "cts-ppm = -100"));
        err.reset();
        assertEquals(ExitCode.BAD_INPUT, run(concat(where, "qa", "--plan", qaPlan.toString(), "--qa-file",
                qaFile.toString())));
        String message = err.toString(StandardCharsets.UTF_8);
        assertTrue(message.contains("bad-qa.plan") && message.contains("line 3") && message.contains("'cts-ppm'"),
                message);

        Files.writeString(qaPlan, qaPlanText("lib/library.manifest").replace("noise-region = 2285..2298",
                "noise-region = 2285 to 2298"));
        err.reset();
        assertEquals(ExitCode.BAD_INPUT, run(concat(where, "qa", "--plan", qaPlan.toString(), "--qa-file",
                qaFile.toString())));
        message = err.toString(StandardCharsets.UTF_8);
        assertTrue(message.contains("line 10") && message.contains("'noise-region'"), message);
        try (WorkspaceStore store = open()) {
            assertTrue(store.qa().checks(ana(store), store.projects().findByCode(ana(store), "P-2").orElseThrow()
                    .getId()).isEmpty(), "no QA check stored");
        }

        Path reportPlan = folder.resolve("bad-report.plan");
        Files.writeString(reportPlan, reportPlanText("o2.csv").replace("limit = 100 per 3 min",
                "limit = 100 per 1 h"));
        Path report = folder.resolve("report-P-2");
        err.reset();
        assertEquals(ExitCode.BAD_INPUT, run(concat(where, "report", "--plan", reportPlan.toString(), "--out",
                report.toString())));
        message = err.toString(StandardCharsets.UTF_8);
        assertTrue(message.contains("bad-report.plan") && message.contains("line 29") && message.contains("'limit'"),
                message);
        Files.writeString(reportPlan, reportPlanText("o2.csv").replace("issued = 2026-03-19T00:00:00Z",
                "issued = 19 March"));
        err.reset();
        assertEquals(ExitCode.BAD_INPUT, run(concat(where, "report", "--plan", reportPlan.toString(), "--out",
                report.toString())));
        message = err.toString(StandardCharsets.UTF_8);
        assertTrue(message.contains("line 7") && message.contains("'issued'"), message);
        assertFalse(Files.exists(report.resolve("report.pdf")) || Files.exists(report.resolve("results.csv")),
                "nothing written");
    }

    @Test
    void methodVersionIsChosenByNumberAndDefaultsToTheNewest() throws Exception {
        Path method = folder.resolve("revised.method");
        Files.writeString(method, methodFile("Revised"));
        ok("method-define", "--workspace", ws, "--as", "ana", "--method", method.toString());
        Files.writeString(method, methodFile("Revised").replace("tolerance = 1e-6", "tolerance = 1e-7"));
        ok("method-define", "--workspace", ws, "--as", "ana", "--method", method.toString());
        String[] where = { "--workspace", ws, "--as", "ana", "--project", "P-3", "--method", "Revised" };
        out.reset();
        assertEquals(ExitCode.OK, run(concat(where, "quantify", "--method-version", "1", "--backgrounds",
                qaFile.toString(), "--file", stackFile.toString())), err.toString());
        assertTrue(out.toString(StandardCharsets.UTF_8).contains("version 1"), out.toString());
        out.reset();
        assertEquals(ExitCode.OK, run(concat(where, "quantify", "--backgrounds", qaFile.toString(), "--file",
                stackFile.toString())), err.toString());
        assertTrue(out.toString(StandardCharsets.UTF_8).contains("version 2"), "the newest by default: " + out);
        err.reset();
        assertEquals(ExitCode.USAGE, run(concat(where, "quantify", "--method-version", "3", "--backgrounds",
                qaFile.toString(), "--file", stackFile.toString())));
        assertTrue(err.toString(StandardCharsets.UTF_8).contains("no version 3"), err.toString());
        err.reset();
        assertEquals(ExitCode.USAGE, run(concat(where, "quantify", "--method-version", "first", "--backgrounds",
                qaFile.toString(), "--file", stackFile.toString())));
        assertTrue(err.toString(StandardCharsets.UTF_8).contains("--method-version"), err.toString());
        try (WorkspaceStore store = open()) {
            String project = store.projects().findByCode(ana(store), "P-3").orElseThrow().getId();
            long versions = store.results().results(ana(store), project).stream()
                    .map(r -> r.getProvenance().methodVersionId()).distinct().count();
            assertEquals(2, versions, "results of both versions, each once");
        }
    }

    @Test
    void malformedPlanAndMethodFilesAreNamedByLineAndKeyAndRecordNothing() throws Exception {
        Path plan = folder.resolve("bad.plan");
        Files.writeString(plan, """
                library = Broken
                temperature = 296
                pressure = hundred
                path-length = 1
                resolution = 8
                apodization = boxcar
                first-wavenumber = 2000
                step = 1
                points = 100
                uncertainty = 0.02

                [compound]
                name = CO
                cas = 630-08-0
                formula = CO
                molar-mass = 28.010
                line-list = co.par
                partition = linear
                ppm-m = 50
                """);
        assertEquals(ExitCode.BAD_INPUT, run("library-build", "--workspace", ws, "--as", "ana", "--plan",
                plan.toString(), "--out", folder.resolve("broken-lib").toString()));
        String message = err.toString(StandardCharsets.UTF_8);
        assertTrue(message.contains("bad.plan") && message.contains("line 3") && message.contains("'pressure'"),
                message);
        assertFalse(Files.exists(folder.resolve("broken-lib")), "no library folder");

        Path method = folder.resolve("bad.method");
        Files.writeString(method, "method = M\nlibrary = lib/library.manifest\npath-length = 4.85\n" + TRANSFORM
                + "\n[analyte]\ncompound = CO\nregion = 2050..2230 baseline one\n");
        err.reset();
        assertEquals(ExitCode.BAD_INPUT, run("method-define", "--workspace", ws, "--as", "ana", "--method",
                method.toString()));
        message = err.toString(StandardCharsets.UTF_8);
        assertTrue(message.contains("bad.method") && message.contains("line 13") && message.contains("'region'"),
                message);
        try (WorkspaceStore store = open()) {
            assertTrue(store.versions().latest(VersionKind.METHOD, "M").isEmpty(), "no method version");
            assertTrue(store.versions().latest(VersionKind.LIBRARY, "Broken").isEmpty(), "no library version");
        }
    }

    @Test
    void everyCommandHasHelp() {
        for (String c : List.of("library-build", "library-add", "method-define", "quantify", "qa", "report",
                "report-sign")) {
            out.reset();
            assertEquals(ExitCode.OK, run("help", c));
            String text = out.toString(StandardCharsets.UTF_8);
            assertTrue(text.contains("usage: tracegas " + c) && text.contains("exit codes"), text);
        }
        out.reset();
        run("help", "report");
        assertTrue(out.toString(StandardCharsets.UTF_8).contains("--method-version"), out.toString());
    }
}
