package org.tracegas.runner.commands;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.campaign.MinuteSeries;
import org.tracegas.campaign.StoredMethod;
import org.tracegas.importer.container.AcquisitionHeader;
import org.tracegas.importer.container.ContainerWriter;
import org.tracegas.importer.container.SampleKind;
import org.tracegas.library.synthesis.AbsorptionPath;
import org.tracegas.library.synthesis.HitranLineListReader;
import org.tracegas.library.synthesis.LineByLineModel;
import org.tracegas.library.synthesis.PowerLawPartitionFunction;
import org.tracegas.preprocess.InterferogramTransform;
import org.tracegas.quantify.CancellationFlag;
import org.tracegas.runner.CommandTable;
import org.tracegas.runner.ExitCode;
import org.tracegas.runner.RunnerContext;
import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.Interferogram;
import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;
import org.tracegas.store.Session;
import org.tracegas.store.VersionKind;
import org.tracegas.store.WorkspaceStore;
import org.tracegas.store.Workspaces;

/**
 * The analysis jobs from the command line on a real H2 workspace with a small invented CO band: a library
 * synthesized from a line list of a few lines, a method defined over it, and three interferograms quantified
 * with the stored method version. Malformed plan and method files are named with line and key and record nothing.
 */
class AnalysisCommandsTest {

    private static final double LASER = 15798.0;
    private static final int HALF = 1024;
    private static final double PATH = 4.85;
    private static final double CELL_T = 464.15;
    private static final double CELL_P = 101.3;

    @TempDir
    Path folder;

    private final ByteArrayOutputStream out = new ByteArrayOutputStream();
    private final ByteArrayOutputStream err = new ByteArrayOutputStream();
    private final Map<String, String> env = Map.of("TRACEGAS_PASSWORD", "admin-pw-1",
            "TRACEGAS_NEW_PASSWORD", "admin-pw-1");

    private int run(String... argv) {
        CancellationFlag cancel = new CancellationFlag();
        CommandTable table = new CommandTable("test", List.of(new WorkspaceInitCommand(), new UserAddCommand(),
                new ProjectAddCommand(),
                new LibraryBuildCommand(cancel), new LibraryAddCommand(), new MethodDefineCommand(),
                new QuantifyCommand(cancel), new QaCommand(), new ReportCommand()));
        return table.dispatch(argv, new RunnerContext(new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8), env));
    }

    /** Invented CO-like lines (numbers plausible, not real molecular data) in the HITRAN 160-character record. */
    private Path lineList() throws IOException {
        StringBuilder s = new StringBuilder();
        for (int j = 0; j < 12; j++) {
            for (int sign : new int[] { -1, 1 }) {
                double wn = 2143.0 + sign * 3.86 * (j + 0.5);
                double intensity = 4e-19 * (j + 1) * Math.exp(-1.93 * j * (j + 1) * 1.4388 / 296.0);
                StringBuilder r = new StringBuilder(String.format(Locale.ROOT, "%2d%1d%12.6f%10.3E%10.3E", 5, 1, wn,
                        intensity, 1.0));
                r.append(".0600 .070").append(String.format(Locale.ROOT, "%10.4f%4.2f", 1.93 * j * (j + 1), 0.72))
                        .append("-.002500");
                while (r.length() < 160) {
                    r.append(' ');
                }
                s.append(r).append('\n');
            }
        }
        Path file = folder.resolve("co.par");
        Files.writeString(file, s);
        return file;
    }

    /** The interferogram of a cell of CO in front of a smooth source, by a direct cosine sum (double-sided). */
    private static Interferogram interferogram(LineByLineModel co, double ppm) {
        SpectralAxis fine = SpectralAxis.uniform(AxisUnit.WAVENUMBER, 1800, 0.1, 7001);
        double[] t = ppm > 0 ? co.transmittance(fine, new AbsorptionPath(CELL_T, CELL_P, ppm, PATH)).toArray()
                : null;
        double[] samples = new double[2 * HALF];
        for (int k = 0; k < fine.size(); k++) {
            double sigma = fine.get(k);
            double edge = Math.min(sigma - 1800, 2500 - sigma) / 100.0;
            double b = Math.min(1.0, edge) * (t == null ? 1.0 : t[k]);
            for (int i = 0; i < samples.length; i++) {
                samples[i] += b * Math.cos(2 * Math.PI * sigma * (i - HALF) * 2 / LASER);
            }
        }
        for (int i = 0; i < samples.length; i++) {
            samples[i] += 2000.0;
        }
        return new Interferogram(samples, LASER, 2);
    }

    private static final String TRANSFORM = """
            [transform]
            apodization = norton-beer-medium
            phase-correction = mertz
            sidedness = double-sided
            zero-fill = 2
            range = 2000..2300
            """;

    @Test
    void libraryMethodAndQuantifyFromTheCommandLine() throws Exception {
        String ws = folder.resolve("ws").toString();
        assertEquals(ExitCode.OK, run("workspace-init", "--workspace", ws, "--admin", "root", "--name", "Admin"));
        assertEquals(ExitCode.OK, run("user-add", "--workspace", ws, "--as", "root", "--login", "ana", "--name",
                "Ana Lyst", "--roles", "analyst"));
        assertEquals(ExitCode.OK, run("project-add", "--workspace", ws, "--as", "ana", "--client", "C", "--code",
                "P-1", "--name", "Survey"), err.toString());
        Path lines = lineList();
        LineByLineModel co = new LineByLineModel(new HitranLineListReader().read(lines), 28.010,
                PowerLawPartitionFunction.linearMolecule());
        Instant t0 = Instant.parse("2026-03-17T08:00:00Z");
        Interferogram empty = interferogram(co, 0);
        Spectrum background = new InterferogramTransform(org.tracegas.campaign.TransformText.read(
                org.tracegas.campaign.KeyValueFile.parse(TRANSFORM, folder.resolve("t")).blocks("transform").get(0)))
                .singleBeam(empty);
        SpectralAxis axis = background.axis();
        Path backgrounds = folder.resolve("bg.tgc");
        try (ContainerWriter w = ContainerWriter.create(backgrounds)) {
            w.append(new AcquisitionHeader(HALF, SampleKind.BACKGROUND, t0.minusSeconds(600), CELL_T, CELL_P * 10,
                    PATH, Map.of()), empty);
            w.commit();
        }
        double[] truth = { 20, 60, 120 };
        Path samples = folder.resolve("stack.tgc");
        try (ContainerWriter w = ContainerWriter.create(samples)) {
            for (int i = 0; i < truth.length; i++) {
                w.append(new AcquisitionHeader(HALF, SampleKind.SAMPLE, t0.plusSeconds(60L * i), CELL_T, CELL_P * 10,
                        PATH, Map.of()), interferogram(co, truth[i]));
            }
            w.commit();
        }

        Path plan = folder.resolve("library.plan");
        Files.writeString(plan, String.format(Locale.ROOT, """
                library = Invented CO references
                temperature = %s
                pressure = %s
                path-length = %s
                resolution = %s
                apodization = norton-beer-medium
                first-wavenumber = %s
                step = %s
                points = %d
                uncertainty = 0.02

                [compound]
                name = CO
                cas = 630-08-0
                formula = CO
                molar-mass = 28.010
                line-list = co.par
                partition = linear
                ppm-m = 48.5, 970
                """, CELL_T, CELL_P, PATH, LASER / 2 / HALF, axis.first(), axis.step(), axis.size()));
        assertEquals(ExitCode.OK, run("library-build", "--workspace", ws, "--as", "ana", "--plan", plan.toString(),
                "--out", folder.resolve("lib").toString()), err.toString());
        assertTrue(Files.isRegularFile(folder.resolve("lib").resolve("library.manifest")));

        Path method = folder.resolve("co.method");
        Files.writeString(method, """
                method = CO only
                library = lib/library.manifest
                path-length = 4.85
                nonlinearity = yes
                tolerance = 1e-6
                """ + TRANSFORM + """

                [analyte]
                compound = CO
                region = 2050..2230 baseline 1
                """);
        assertEquals(ExitCode.OK, run("method-define", "--workspace", ws, "--as", "ana", "--method",
                method.toString()), err.toString());
        assertEquals(ExitCode.OK, run("quantify", "--workspace", ws, "--as", "ana", "--project", "P-1", "--method",
                "CO only", "--backgrounds", backgrounds.toString(), "--file", samples.toString()), err.toString());
        assertEquals(ExitCode.BAD_INPUT, run("quantify", "--workspace", ws, "--as", "ana", "--project", "P-1",
                "--method", "CO only", "--backgrounds", backgrounds.toString(), "--file", samples.toString()),
                "a second run would repeat the results");

        try (WorkspaceStore store = Workspaces.openH2(folder.resolve("ws").resolve("db"))) {
            Session s = store.users().logIn("ana", "admin-pw-1".toCharArray());
            var version = store.versions().latest(VersionKind.METHOD, "CO only").orElseThrow();
            StoredMethod stored = StoredMethod.parse(store.versions().content(version.id()), "test");
            assertEquals(version.contentHash().length(), 64);
            assertEquals(1, store.versions().latest(VersionKind.LIBRARY).size(), "the library is recorded once");
            String project = store.projects().findByCode(s, "P-1").orElseThrow().id();
            MinuteSeries series = MinuteSeries.of(store.projects().measurements(s, project),
                    store.results().results(s, project), version.id());
            assertEquals(stored.libraryVersionId(), series.libraryVersionId());
            assertEquals(truth.length, series.compound("CO").size());
            for (int i = 0; i < truth.length; i++) {
                // references from the same line list close the chain; the 7.7 cm-1 instrument of this small test
                // leaves a bias of about 10 % (the demo's 0.5 cm-1 instrument stays within 3 %)
                assertEquals(truth[i], series.compound("CO").get(i).ppm(), 0.15 * truth[i], "sample " + i);
            }
            assertTrue(store.verifyAuditTrail().intact());
        }
    }

    @Test
    void malformedPlanAndMethodFilesAreNamedByLineAndKeyAndRecordNothing() throws Exception {
        String ws = folder.resolve("ws").toString();
        assertEquals(ExitCode.OK, run("workspace-init", "--workspace", ws, "--admin", "root", "--name", "Admin"));
        assertEquals(ExitCode.OK, run("user-add", "--workspace", ws, "--as", "root", "--login", "ana", "--name",
                "Ana Lyst", "--roles", "analyst"));
        lineList();
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
                plan.toString(), "--out", folder.resolve("lib").toString()));
        String message = err.toString(StandardCharsets.UTF_8);
        assertTrue(message.contains("bad.plan") && message.contains("line 3") && message.contains("'pressure'"),
                message);
        assertFalse(Files.exists(folder.resolve("lib")), "no library folder");

        Path method = folder.resolve("bad.method");
        Files.writeString(method, "method = M\nlibrary = lib/library.manifest\npath-length = 4.85\n" + TRANSFORM
                + "\n[analyte]\ncompound = CO\nregion = 2050..2230 baseline one\n");
        err.reset();
        assertEquals(ExitCode.BAD_INPUT, run("method-define", "--workspace", ws, "--as", "ana", "--method",
                method.toString()));
        message = err.toString(StandardCharsets.UTF_8);
        assertTrue(message.contains("bad.method") && message.contains("line 13") && message.contains("'region'"),
                message);
        try (WorkspaceStore store = Workspaces.openH2(folder.resolve("ws").resolve("db"))) {
            assertTrue(store.versions().latest(VersionKind.METHOD).isEmpty(), "no method version");
            assertTrue(store.versions().latest(VersionKind.LIBRARY).isEmpty(), "no library version");
        }
    }

    @Test
    void everyCommandHasHelp() {
        for (String c : List.of("library-build", "library-add", "method-define", "quantify", "qa", "report")) {
            out.reset();
            assertEquals(ExitCode.OK, run("help", c));
            String text = out.toString(StandardCharsets.UTF_8);
            assertTrue(text.contains("usage: tracegas " + c) && text.contains("exit codes"), text);
        }
    }
}
