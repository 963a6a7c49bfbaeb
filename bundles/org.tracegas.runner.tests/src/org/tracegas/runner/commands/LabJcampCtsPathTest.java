package org.tracegas.runner.commands;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.stream.Collectors;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.model.Measurement;
import org.tracegas.model.Result;
import org.tracegas.model.ResultConditions;
import org.tracegas.runner.ExitCode;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;
import org.tracegas.store.Workspaces;

/**
 * A method whose path source is CTS-derived quantifies the lab's imported JCAMP-DX files: the CTS measurements
 * among the project's files (each record stating its role) give the effective path, as the CTS readings of an
 * interferogram container do. The lab's cell is 2 m: the samples and the CTS spectra are made by the lab's
 * generator ({@link LabSpectra}, apart from the fit's model) with their gas on 2 m at the cell's conditions,
 * while the method states 1.9 m, as for a cell whose mirrors were set up again. The results must come out as the
 * amounts the spectra were made with, within the tolerance of {@link LabJcampQuantificationTest} (3 % plus
 * 0.3 ppm); the nominal 1.9 m would read every one 5 % high.
 */
class LabJcampCtsPathTest {

    private static final String CTS_METHOD = "Kiln stack CTS path";

    @TempDir
    Path folder;

    @Test
    void importedCtsMeasurementsGiveThePathOfAMethodThatTakesItFromThem() throws Exception {
        LabJcampQuantificationTest.Lab lab = new LabJcampQuantificationTest.Lab(folder,
                List.of("--workspace", folder.resolve("ws").toString()), 8);
        lab.setUp();
        Path method = Files.writeString(folder.resolve("cts.method"), LabJcampQuantificationTest.METHOD
                .replace("method = Kiln stack CO and N2O", "method = " + CTS_METHOD)
                .replace("path-length = 2.0\n", "path-length = 1.9\npath-source = cts-derived\n"));
        lab.ok("method-define", "--method", method.toString());
        Path plan = Files.writeString(folder.resolve("qa.plan"), LabJcampQaTest.PLAN);
        List<String> quantify = new ArrayList<>(lab.quantifyArguments());
        quantify.set(quantify.indexOf("Kiln stack CO and N2O"), CTS_METHOD);

        assertEquals(ExitCode.BAD_INPUT, lab.run(quantify.toArray(String[]::new)), "the CTS path needs the plan");
        assertTrue(lab.errors().contains("--qa-plan"), lab.errors());
        List<String> withPlan = new ArrayList<>(quantify);
        withPlan.addAll(List.of("--qa-plan", plan.toString()));
        assertEquals(ExitCode.BAD_INPUT, lab.run(withPlan.toArray(String[]::new)), "no CTS measurement yet");
        assertTrue(lab.errors().contains("no CTS reading") && lab.errors().contains("nothing quantified"),
                lab.errors());
        List<String> nominal = new ArrayList<>(lab.quantifyArguments());
        nominal.addAll(List.of("--qa-plan", plan.toString()));
        assertEquals(ExitCode.USAGE, lab.run(nominal.toArray(String[]::new)), "a nominal path needs no plan");
        assertTrue(lab.ok("results-export", "--project", "LBK-5", "--out", folder.resolve("none.csv").toString())
                .contains("Wrote 0 result(s)"), "the refused runs stored nothing");

        // the CTS files of the day come with the samples: they give the path before anything is stored
        Random r = new Random(20260507);
        double cts = LabJcampQaTest.CTS_PPM * LabJcampQuantificationTest.PATH_M
                * LabJcampQuantificationTest.CELL_DENSITY;
        Instant t0 = LabJcampQuantificationTest.T0;
        Path qa = Files.createDirectories(folder.resolve("qa"));
        withPlan.addAll(List.of("--file", LabJcampQaTest.write(qa, "cts-before.jdx", Map.of("CO", cts),
                t0.minusSeconds(300), "cts", r, lab).toString(), "--file", LabJcampQaTest.write(qa, "cts-after.jdx",
                        Map.of("CO", cts), t0.plusSeconds(8 * 1800), "cts", r, lab).toString()));
        String out = lab.ok(withPlan.toArray(String[]::new));
        assertTrue(out.contains("derived from the CTS readings (nominal 1.9 m)")
                && out.contains("Quantified 8 measurement(s)"), out);

        try (WorkspaceStore store = Workspaces.openH2(folder.resolve("ws").resolve("db"))) {
            Session ana = store.users().logIn("ana", "lab-pw-12".toCharArray());
            String project = store.projects().findByCode(ana, "LBK-5").orElseThrow().getId();
            Map<String, String> fileOf = store.imports().measurements(ana, project).stream().collect(
                    Collectors.toMap(Measurement::getId, Measurement::getSourceFile));
            List<Result> results = store.results().results(ana, project);
            assertEquals(2 * 8, results.size(), "the CTS measurements are not samples");
            for (Result x : results) {
                String file = fileOf.get(x.getMeasurementId());
                double truth = lab.truthByFile.get(file).get(x.getCompound());
                double ppm = x.getConcentration();
                assertTrue(Math.abs(ppm - truth) <= 0.03 * truth + 0.3, file + " " + x.getCompound() + ": "
                        + ppm + " ppm, made with " + truth + " ppm");
                ResultConditions c = x.getConditions();
                assertEquals("cts-derived", c.pathOrigin());
                // the CTS band gives the 2 m the spectra were made with, within the 2 % LabJcampQaTest allows
                assertEquals(LabJcampQuantificationTest.PATH_M, c.pathM(), 0.02 * LabJcampQuantificationTest.PATH_M);
                // C_corr = (L_r/L_s)(T_s/T_r)(p_r/p_s) C_calc, EPA FTIR Protocol section 11.2 (standards notes)
                assertEquals((1.9 / c.pathM()) / LabJcampQuantificationTest.CELL_DENSITY, c.correctionFactor(),
                        1e-12);
            }
            assertTrue(store.verifyAuditTrail().intact());
        }
    }
}
