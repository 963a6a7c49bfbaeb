package org.tracegas.runner.commands;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.Statement;
import java.time.Instant;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Random;
import java.util.UUID;
import java.util.stream.Collectors;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.postgresql.ds.PGSimpleDataSource;
import org.tracegas.importer.ReaderRegistry;
import org.tracegas.importer.delimited.DelimitedReader;
import org.tracegas.importer.jcamp.JcampReader;
import org.tracegas.importer.jcamp.JcampWriter;
import org.tracegas.model.Measurement;
import org.tracegas.model.Result;
import org.tracegas.model.ResultConditions;
import org.tracegas.preprocess.StepRegistry;
import org.tracegas.quantify.CancellationFlag;
import org.tracegas.runner.CommandTable;
import org.tracegas.runner.ExitCode;
import org.tracegas.runner.RunnerContext;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.Spectrum;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;
import org.tracegas.store.Workspaces;

/**
 * A lab quantifies its own JCAMP-DX spectra from the command line, on a fresh embedded workspace and on the
 * PostgreSQL lab server (system properties tracegas.test.pg.url, .user and .password; a fresh schema): a
 * library from JCAMP-DX reference files at several amounts (conditions from the files' labels and from the
 * manifest), a method file with a recipe, 24 samples in every compression form (absorbance, transmittance, and
 * single beams with their background), quantify, the CSV export. The spectra come from {@link LabSpectra}, a
 * generator apart from the fit's model (mixtures made in transmittance, saturated lines, an instrument line shape
 * of its own); the concentrations recovered are checked against the amounts the spectra were made with. The
 * invented scenario: the Larkspur Bay kiln lab measures its stack with a 2 m cell.
 */
class LabJcampQuantificationTest {

    static final double PATH_M = 2.0;
    /** Molecules in the sample cell (313.15 K, 1009 hPa) per those in the references' (296 K, 1013.25 hPa). */
    static final double CELL_DENSITY = (296.0 / 313.15) * (1009.0 / 1013.25);
    /** Reference amounts, ppm·m, each a factor 1.5 from the next (as the runner's other tests space them). */
    static final double[] CO_REFS = { 40, 60, 90, 135, 202.5, 303.75, 455.625, 683.4375 };
    static final double[] N2O_REFS = { 12, 18, 27, 40.5, 60.75, 91.125, 136.6875 };
    static final int SAMPLES = 24;
    static final Instant T0 = Instant.parse("2026-05-04T06:00:00Z");
    /** The users' passwords, and the lab server's, in the environment: never on a command line. */
    static final Map<String, String> ENV = Map.of("TRACEGAS_PASSWORD", "lab-pw-12", "TRACEGAS_NEW_PASSWORD",
            "lab-pw-12", "TRACEGAS_DB_PASSWORD", System.getProperty("tracegas.test.pg.password", "tracegas"));

    @TempDir
    Path folder;

    /** A lab's whole day, files to results, given the workspace options. */
    static final class Lab {
        final Path folder;
        final List<String> workspace;
        final LabSpectra spectra = new LabSpectra();
        final Map<String, Map<String, Double>> truthByFile = new LinkedHashMap<>();
        final List<Path> samples = new ArrayList<>();
        final int sampleCount;
        /** The readers of the lab's files: JCAMP-DX and delimited text unless a test gives others. */
        ReaderRegistry readers = new ReaderRegistry().register("jcamp", "JCAMP-DX", new JcampReader())
                .register("delimited", "delimited text", new DelimitedReader());
        /** Whether the next command runs already cancelled (as if the user stopped it before its first fit). */
        boolean cancelNext;
        Path background;
        final ByteArrayOutputStream out = new ByteArrayOutputStream();
        final ByteArrayOutputStream err = new ByteArrayOutputStream();

        /** @param sampleCount samples of the day: the last three are single beams, the three before transmittances */
        Lab(Path folder, List<String> workspace, int sampleCount) {
            this.folder = folder;
            this.workspace = List.copyOf(workspace);
            this.sampleCount = sampleCount;
        }

        int run(String... argv) {
            out.reset();
            err.reset();
            List<String> all = new ArrayList<>(List.of(argv));
            if (!argv[0].equals("workspace-init")) {
                all.addAll(1, List.of("--as", argv[0].equals("user-add") ? "root" : "ana"));
            }
            all.addAll(1, workspace);
            CancellationFlag cancel = new CancellationFlag();
            if (cancelNext) {
                cancel.cancel();
                cancelNext = false;
            }
            CommandTable table = new CommandTable("test", List.of(new WorkspaceInitCommand(), new UserAddCommand(),
                    new ProjectAddCommand(), new MethodDefineCommand(), new ImportCommand(readers),
                    new QuantifyCommand(cancel, readers, StepRegistry.withBuiltInSteps()),
                    new ResultsExportCommand(), new QaCommand(), new ReportCommand()));
            return table.dispatch(all.toArray(String[]::new), new RunnerContext(new PrintStream(out, true,
                    StandardCharsets.UTF_8), new PrintStream(err, true, StandardCharsets.UTF_8), ENV));
        }

        String ok(String... argv) {
            int code = run(argv);
            String o = out.toString(StandardCharsets.UTF_8);
            assertEquals(ExitCode.OK, code, () -> String.join(" ", argv) + ": " + err.toString(StandardCharsets.UTF_8)
                    + o);
            return o;
        }

        String errors() {
            return err.toString(StandardCharsets.UTF_8);
        }

        void setUp() throws Exception {
            setUpWorkspace();
            writeSamples();
        }

        /** The workspace, its users and project, the library and the method, without samples. */
        void setUpWorkspace() throws Exception {
            ok("workspace-init", "--admin", "root", "--name", "Lab administrator");
            ok("user-add", "--login", "ana", "--name", "Ana Lyst", "--roles", "analyst");
            ok("project-add", "--client", "Larkspur Bay Kilns", "--code", "LBK-5", "--name", "Kiln 5 stack, May");
            writeLibrary();
            Files.writeString(folder.resolve("kiln.method"), METHOD);
            ok("method-define", "--method", folder.resolve("kiln.method").toString());
        }

        /** JCAMP-DX references at several amounts; CO's files state every condition, N2O's leave some to the manifest. */
        void writeLibrary() throws Exception {
            Path lib = Files.createDirectories(folder.resolve("lib"));
            StringBuilder manifest = new StringBuilder("library = Larkspur Bay references\n");
            for (double x : CO_REFS) {
                String name = String.format(Locale.ROOT, "co-%08.3f.jdx", x);
                Map<String, String> labels = new LinkedHashMap<>();
                labels.put("$COMPOUND", "CO");
                labels.put("CAS REGISTRY NO", "630-08-0");
                labels.put("MOLFORM", "C O");
                labels.put("MW", "28.010");
                labels.put("$PPM-M", Double.toString(x));
                labels.put("$CELL TEMPERATURE", "296.0");
                labels.put("$CELL PRESSURE", "1013.25");
                labels.put("RESOLUTION", "0.5");
                labels.put("$APODIZATION", "Norton-Beer medium");
                labels.put("$REFERENCE ORIGIN", "synthetic");
                labels.put("$UNCERTAINTY", "0.02");
                Files.writeString(lib.resolve(name), JcampForms.write(spectra.absorbance(Map.of("CO", x), 0, 0, 0,
                        null), "CO " + x + " ppm m", labels, JcampForms.Form.AFFN));
                manifest.append("\n[reference]\nfile = ").append(name).append('\n');
            }
            for (double x : N2O_REFS) {
                String name = String.format(Locale.ROOT, "n2o-%08.3f.jdx", x);
                Files.writeString(lib.resolve(name), JcampWriter.defaultPrecision().write(spectra.absorbance(
                        Map.of("N2O", x), 0, 0, 0, null), "N2O " + x + " ppm m", Map.of("PPM-M", Double.toString(x),
                                "COMPOUND", "N2O")));
                manifest.append("\n[reference]\nfile = ").append(name).append('\n').append("""
                        cas = 10024-97-2
                        formula = N2O
                        molar-mass = 44.013
                        temperature = 296
                        pressure = 101.325
                        resolution = 0.5
                        apodization = Norton-Beer medium
                        origin = synthetic
                        origin-text = Larkspur Bay generator, Lorentz lines
                        uncertainty = 0.02
                        """);
            }
            Files.writeString(lib.resolve("library.manifest"), manifest);
        }

        /**
         * 24 samples over a day: 18 absorbance files in the five forms, 3 transmittance and 3 single beams with one
         * background single beam before them. Baselines tilt and offset as a drifting cell window's would.
         */
        void writeSamples() throws Exception {
            Random r = new Random(20260504);
            Path day = Files.createDirectories(folder.resolve("day"));
            double[] source = LabSpectra.source();
            Instant bgTime = T0.minusSeconds(600);
            background = day.resolve("background.jdx");
            Files.writeString(background, JcampForms.write(new Spectrum(LabSpectra.AXIS, source, Ordinate.SINGLE_BEAM),
                    "Kiln 5 background, N2 purge", Map.of("LONGDATE", stamp(bgTime), "$CONTENT", "single beam",
                            "$KIND", "background", "$CELL TEMPERATURE", "313.15", "$CELL PRESSURE", "1009.0"),
                    JcampForms.Form.AFFN));
            JcampForms.Form[] forms = JcampForms.Form.values();
            for (int i = 0; i < sampleCount; i++) {
                double co = 30 + 270 * r.nextDouble();
                double n2o = 8 + 55 * r.nextDouble();
                // the cell at 313.15 K and 100.9 kPa holds fewer molecules per ppm than the references' at 296 K
                // and 101.325 kPa: absorbance follows the number density, p/T for an ideal gas (EPA FTIR
                // Protocol section 11.2 corrects by these ratios), so the made amount shows as this much less
                Map<String, Double> amounts = Map.of("CO", co * PATH_M * CELL_DENSITY, "N2O",
                        n2o * PATH_M * CELL_DENSITY);
                Instant t = T0.plusSeconds(1800L * i);
                Map<String, String> labels = new LinkedHashMap<>();
                if (i % 2 == 0) {
                    labels.put("LONGDATE", stamp(t));
                } else {
                    String s = stamp(t);
                    labels.put("DATE", s.substring(2, 10));
                    labels.put("TIME", s.substring(11));
                }
                labels.put("$CELL TEMPERATURE", "313.15");
                labels.put("$CELL PRESSURE", "1009.0");
                String title = "Kiln 5 stack " + (i + 1);
                Path file = day.resolve(String.format(Locale.ROOT, "stack-%02d.jdx", i + 1));
                String text;
                if (i >= sampleCount - 3) {
                    labels.put("$CONTENT", "single beam");
                    double[] t1 = spectra.transmittance(amounts);
                    text = JcampForms.write(new Spectrum(LabSpectra.AXIS, LabSpectra.times(source, t1),
                            Ordinate.SINGLE_BEAM), title, labels, JcampForms.Form.SQZ);
                } else if (i >= sampleCount - 6) {
                    Spectrum a = spectra.absorbance(amounts, 0, 0, 0, null);
                    double[] t1 = new double[a.size()];
                    for (int k = 0; k < t1.length; k++) {
                        t1[k] = Math.pow(10, -a.get(k));
                    }
                    text = JcampForms.write(new Spectrum(LabSpectra.AXIS, t1, Ordinate.TRANSMITTANCE), title, labels,
                            i == sampleCount - 6 ? JcampForms.Form.DIFDUP : JcampForms.Form.PAC);
                } else {
                    Spectrum a = spectra.absorbance(amounts, 0.004 + 0.001 * r.nextGaussian(),
                            2e-5 * r.nextGaussian(), 2e-4, r);
                    text = JcampForms.write(a, title, labels, forms[i % forms.length]);
                }
                Files.writeString(file, text);
                samples.add(file);
                truthByFile.put(file.getFileName().toString(), Map.of("CO", co, "N2O", n2o));
            }
        }

        List<String> quantifyArguments() {
            List<String> a = new ArrayList<>(List.of("quantify", "--project", "LBK-5", "--method",
                    "Kiln stack CO and N2O", "--background-file", background.toString()));
            for (Path f : samples) {
                a.add("--file");
                a.add(f.toString());
            }
            return a;
        }
    }

    static final String METHOD = """
            method = Kiln stack CO and N2O
            library = lib/library.manifest
            path-length = 2.0
            nonlinearity = yes
            tolerance = 1e-7

            [transform]
            apodization = norton-beer-medium
            phase-correction = mertz
            sidedness = double-sided
            zero-fill = 2
            range = 2000..2300

            [recipe]
            step = baseline degree=1;regions=2000:2060,2270:2300

            [analyte]
            compound = CO
            interferents = N2O
            region = 2060..2195 baseline 1

            [analyte]
            compound = N2O
            interferents = CO
            region = 2198..2245 baseline 1
            """;

    static String stamp(Instant t) {
        return t.toString().replace('-', '/').replace('T', ' ').replace("Z", "");
    }

    @Test
    void labQuantifiesItsJcampSpectraOnTheEmbeddedWorkspace() throws Exception {
        Lab lab = new Lab(folder, List.of("--workspace", folder.resolve("ws").toString()), SAMPLES);
        lab.setUp();
        dayOfTheLab(lab);
        try (WorkspaceStore store = Workspaces.openH2(folder.resolve("ws").resolve("db"))) {
            checkStored(lab, store);
        }
    }

    @Test
    void labQuantifiesItsJcampSpectraOnTheLabServer() throws Exception {
        onLabServer((schemaUrl, user, password) -> {
            Lab lab = new Lab(folder, List.of("--server", schemaUrl, "--user", user), SAMPLES);
            lab.setUp();
            dayOfTheLab(lab);
            try (WorkspaceStore store = Workspaces.openPostgres(schemaUrl, user, password)) {
                checkStored(lab, store);
            }
        });
    }

    /** A lab day on the lab server, given the JDBC url of its own schema, the user and the password. */
    interface ServerDay {
        void run(String schemaUrl, String user, String password) throws Exception;
    }

    /**
     * Runs a day on the PostgreSQL lab server (system properties tracegas.test.pg.url, .user and .password) in a
     * fresh schema, dropped afterwards.
     */
    static void onLabServer(ServerDay day) throws Exception {
        String url = System.getProperty("tracegas.test.pg.url", "jdbc:postgresql://127.0.0.1:55432/tracegas");
        String user = System.getProperty("tracegas.test.pg.user", "tracegas");
        String password = System.getProperty("tracegas.test.pg.password", "tracegas");
        String schema = "lab_" + UUID.randomUUID().toString().replace("-", "");
        try (Connection c = connect(url, user, password); Statement s = c.createStatement()) {
            s.execute("CREATE SCHEMA " + schema);
        }
        String schemaUrl = url + (url.contains("?") ? "&" : "?") + "currentSchema=" + schema;
        try {
            day.run(schemaUrl, user, password);
        } finally {
            try (Connection c = connect(url, user, password); Statement s = c.createStatement()) {
                s.execute("DROP SCHEMA " + schema + " CASCADE");
            }
        }
    }

    static Connection connect(String url, String user, String password) throws java.sql.SQLException {
        PGSimpleDataSource ds = new PGSimpleDataSource();
        ds.setURL(url);
        ds.setUser(user);
        ds.setPassword(password);
        return ds.getConnection();
    }

    /** Bad input first (nothing stored), then the day's files, again (all skipped), and the CSV export. */
    static void dayOfTheLab(Lab lab) throws Exception {
        Path stray = lab.folder.resolve("notes.bin");
        Files.write(stray, new byte[] { 0, 1, 2, 3, (byte) 0xff });
        List<String> args = lab.quantifyArguments();
        args.addAll(List.of("--file", stray.toString()));
        assertEquals(ExitCode.BAD_INPUT, lab.run(args.toArray(String[]::new)));
        assertTrue(lab.errors().contains("notes.bin") && lab.errors().contains("no registered reader"),
                lab.errors());

        // an axis that ends before the N2O region: named by file and field, nothing stored
        Path narrow = lab.folder.resolve("narrow.jdx");
        Spectrum full = lab.spectra.absorbance(Map.of("CO", 100.0), 0, 0, 0, null);
        Files.writeString(narrow, JcampWriter.defaultPrecision().write(new Spectrum(
                org.tracegas.spectrum.SpectralAxis.uniform(org.tracegas.spectrum.AxisUnit.WAVENUMBER, 2000, 0.25, 801),
                java.util.Arrays.copyOf(full.toArray(), 801), Ordinate.ABSORBANCE), "narrow", Map.of("LONGDATE",
                        stamp(T0), "CELL TEMPERATURE", "313.15", "CELL PRESSURE", "1009")));
        args = lab.quantifyArguments();
        args.addAll(List.of("--file", narrow.toString()));
        assertEquals(ExitCode.BAD_INPUT, lab.run(args.toArray(String[]::new)));
        assertTrue(lab.errors().contains("narrow.jdx") && lab.errors().contains("axis")
                && lab.errors().contains("does not cover the region"), lab.errors());

        // a transmittance of zero inside the CO window: its absorbance is not finite
        Path dark = lab.folder.resolve("dark.jdx");
        double[] t = lab.spectra.transmittance(Map.of("CO", 100.0));
        t[500] = 0; // 2125 cm-1
        Files.writeString(dark, JcampForms.write(new Spectrum(LabSpectra.AXIS, t, Ordinate.TRANSMITTANCE), "dark",
                Map.of("LONGDATE", stamp(T0), "$CELL TEMPERATURE", "313.15", "$CELL PRESSURE", "1009"),
                JcampForms.Form.AFFN));
        args = lab.quantifyArguments();
        args.addAll(List.of("--file", dark.toString()));
        assertEquals(ExitCode.BAD_INPUT, lab.run(args.toArray(String[]::new)));
        assertTrue(lab.errors().contains("dark.jdx") && lab.errors().contains("absorbance")
                && lab.errors().contains("2125.0"), lab.errors());
        assertTrue(lab.ok("results-export", "--project", "LBK-5", "--out", lab.folder.resolve("none.csv").toString())
                .contains("Wrote 0 result(s)"), "the refused runs stored nothing");

        String first = lab.ok(lab.quantifyArguments().toArray(String[]::new));
        assertTrue(first.contains("Quantified " + SAMPLES + " measurement(s)") && first.contains("skipped 0"), first);
        String again = lab.ok(lab.quantifyArguments().toArray(String[]::new));
        assertTrue(again.contains("Quantified 0 measurement(s)") && again.contains("skipped " + SAMPLES)
                && again.contains("already imported as stack-01.jdx"), again);

        Path csv = lab.folder.resolve("out").resolve("kiln-5.csv");
        Files.createDirectories(csv.getParent());
        assertTrue(lab.ok("results-export", "--project", "LBK-5", "--out", csv.toString())
                .contains("Wrote " + 2 * SAMPLES + " result(s)"));
    }

    /**
     * Every sample's CO and N2O against the amounts its spectrum was made with. The tolerance, 3 % of the value
     * plus 0.3 ppm, is what interpolating between references a factor 1.5 apart leaves of a saturated band
     * convolved with a line shape the method does not know, plus the noise of 2e-4 absorbance (common practice,
     * no source). EPA Method 320 section 8.6.2 accepts a QA spike whose mean lies within 0.7-1.3 times the expected
     * value (from memory, not confirmed in a retrieved text), far wider.
     */
    static void checkStored(Lab lab, WorkspaceStore store) throws Exception {
        Session ana = store.users().logIn("ana", "lab-pw-12".toCharArray());
        String project = store.projects().findByCode(ana, "LBK-5").orElseThrow().getId();
        List<Measurement> measurements = store.imports().measurements(ana, project);
        assertEquals(SAMPLES + 1, measurements.size(), "24 samples and one background, each imported once");
        Map<String, Measurement> byId = measurements.stream().collect(Collectors.toMap(
                m -> m.getId(), m -> m));
        List<Result> results = store.results().results(ana, project);
        assertEquals(2 * SAMPLES, results.size());
        double worst = 0;
        for (Result r : results) {
            Measurement m = byId.get(r.getMeasurementId());
            double truth = lab.truthByFile.get(m.getSourceFile()).get(r.getCompound());
            double error = Math.abs(r.getConcentration() - truth);
            worst = Math.max(worst, error / truth);
            assertTrue(error <= 0.03 * truth + 0.3, () -> m.getSourceFile() + " " + r.getCompound() + ": "
                    + r.getConcentration() + " ppm, made with " + truth + " ppm");
            assertTrue(r.getStandardUncertainty() > 0 && Double.isFinite(r.getStandardUncertainty()));
            // corrected from the references' cell to the file's, EPA FTIR Protocol section 11.2 (standards notes)
            ResultConditions c = r.getConditions();
            assertEquals(313.15, c.cellTemperatureK());
            assertEquals("file-label", c.temperatureOrigin());
            assertEquals(100.9, c.cellPressureKPa(), 1e-12);
            assertEquals("file-label", c.pressureOrigin());
            assertEquals(296.0, c.referenceTemperatureK());
            assertEquals(101.325, c.referencePressureKPa());
            assertEquals(PATH_M, c.pathM());
            assertEquals("nominal", c.pathOrigin());
            assertEquals(1 / CELL_DENSITY, c.correctionFactor(), 1e-12);
            // no file here is an interferogram: the transform of none is known, F = 1 is stated
            assertEquals(1.0, c.noiseFactor());
            assertTrue(c.noiseFactorOrigin().contains("imported as such"), c.noiseFactorOrigin());
        }
        System.out.printf(Locale.ROOT, "lab JCAMP-DX day: worst relative error %.4f over %d results%n", worst,
                results.size());
        // the CSV holds each stored result with its file and the recipe that ran
        List<String> lines = Files.readAllLines(lab.folder.resolve("out").resolve("kiln-5.csv"));
        assertEquals(String.join(",", org.tracegas.report.campaign.ResultsCsv.HEADER), lines.get(0));
        assertEquals(2 * SAMPLES + 1, lines.size());
        for (String line : lines.subList(1, lines.size())) {
            String[] f = line.split(",", -1);
            Result stored = results.stream().filter(r -> r.getMeasurementId().equals(f[0])
                    && r.getCompound().equals(f[3])).findFirst().orElseThrow();
            assertEquals(stored.getConcentration(), Double.parseDouble(f[4]));
            assertEquals(byId.get(f[0]).getSourceFile(), f[2]);
            assertEquals(stored.getProvenance().inputHash(), f[13]);
            assertEquals(313.15, Double.parseDouble(f[15]));
            assertEquals("file-label", f[16]);
            assertEquals(stored.getConditions().correctionFactor(), Double.parseDouble(f[24]));
            assertEquals(1.0, Double.parseDouble(f[25]));
            String recipe = store.analyses().recipe(ana, f[14]);
            assertTrue(recipe.contains("baseline degree=1;regions=2000:2060,2270:2300"), recipe);
            if (f[2].compareTo("stack-22.jdx") >= 0) {
                assertTrue(recipe.contains("ratio background="), "single beams are ratioed: " + recipe);
            } else if (f[2].compareTo("stack-19.jdx") >= 0) {
                assertTrue(recipe.contains("absorbance-from-transmittance"), recipe);
            }
        }
        assertTrue(store.verifyAuditTrail().intact());
    }
}
