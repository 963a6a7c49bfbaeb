package org.tracegas.runner.commands;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import java.util.stream.Collectors;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.model.Measurement;
import org.tracegas.model.Result;
import org.tracegas.runner.ExitCode;
import org.tracegas.spectrum.Spectrum;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;
import org.tracegas.store.Workspaces;

/**
 * The lab's QA measurements as JCAMP-DX files imported into its embedded workspace, each record stating its role:
 * the qa command takes them from the project (no QA container), fits them as quantify fits samples, and judges
 * them with the checks the plan names; quantify leaves them out of the results. The CTS spectra are made by the
 * lab's generator with CO filling the 2 m cell at the sample cell's conditions, so the path the check derives
 * with EPA Method 320 section 10.2's L_s = L_r(A_s/A_r)(C_r/C_s)(T_s/T_r)(p_r/p_s) must come out as the 2 m the
 * spectra were made with; the zero gas carries the generator's detector noise of 2e-4 absorbance (standard
 * deviation), which the noise check must find as its RMS.
 */
class LabJcampQaTest {

    static final double CTS_PPM = 100;
    static final double NOISE = 2e-4;
    /** The QA plan of the lab's CO and N2O method; the plan folder holds the method's library folder lib. */
    static final String PLAN = """
            library = lib/library.manifest
            cts-compound = CO
            cts-ppm = 100
            cts-band = 2060..2195
            spike-analyte = CO
            tracer = N2O
            spike-analyte-ppm = 60
            spike-tracer-ppm = 2
            analytes = CO, N2O
            noise-region = 2250..2300
            maximum-noise = 2e-3
            background-age-limit = 24 h
            """;
    static final Pattern LINE = Pattern.compile("(pass|FAIL) +([A-Za-z0-9 ]+): (\\S+) ");

    @TempDir
    Path folder;

    /** A QA measurement of the lab's cell at 313.15 K and 100.9 kPa, its role in the label $ROLE. */
    static Path write(Path dir, String name, Map<String, Double> ppmMetres, Instant time, String role,
            Random r, LabJcampQuantificationTest.Lab lab) throws Exception {
        Map<String, String> labels = new LinkedHashMap<>();
        labels.put("LONGDATE", LabJcampQuantificationTest.stamp(time));
        labels.put("$CELL TEMPERATURE", "313.15");
        labels.put("$CELL PRESSURE", "1009.0");
        labels.put("$ROLE", role);
        Path file = dir.resolve(name);
        Files.writeString(file, JcampForms.write(lab.spectra.absorbance(ppmMetres, 0, 0, NOISE, r),
                "Kiln 5 " + role + " " + name, labels, JcampForms.Form.AFFN));
        return file;
    }

    /** Reading of each check in the command's output, by check name (the last when a check repeats). */
    private static Map<String, Double> readings(String out) {
        Map<String, Double> found = new LinkedHashMap<>();
        Matcher m = LINE.matcher(out);
        while (m.find()) {
            found.put(m.group(2).strip(), Double.parseDouble(m.group(3)));
        }
        return found;
    }

    @Test
    void qaOfTheLabsImportedJcampFiles() throws Exception {
        LabJcampQuantificationTest.Lab lab = new LabJcampQuantificationTest.Lab(folder,
                List.of("--workspace", folder.resolve("ws").toString()), 8);
        lab.setUp();
        String out = qaOfTheDay(lab);
        Map<String, Double> read = readings(out);
        assertEquals(LabJcampQuantificationTest.PATH_M, read.get("CTS path length"), 0.02 * 2.0, out);
        assertEquals(0.0, read.get("CTS drift"), 1.0, out);
        assertEquals(NOISE, read.get("Noise level"), 0.25 * NOISE, out);
        assertTrue(read.containsKey("Zero CO") && read.containsKey("Zero N2O") && read.containsKey("Background age"),
                out);
    }

    /**
     * The samples quantified, the QA files of the day (CTS before and after, zero gas) imported into project LBK-5
     * and judged with the plan written as qa.plan in the lab's folder; every check passes. The qa command's output.
     */
    static String qaOfTheDay(LabJcampQuantificationTest.Lab lab) throws Exception {
        lab.ok(lab.quantifyArguments().toArray(String[]::new));

        Path qa = Files.createDirectories(lab.folder.resolve("qa"));
        Random r = new Random(20260505);
        // CO at the certified content fills the 2 m cell at 313.15 K and 100.9 kPa: fewer molecules than at the
        // references' conditions, as LabJcampQuantificationTest makes its samples
        Map<String, Double> cts = Map.of("CO", CTS_PPM * LabJcampQuantificationTest.PATH_M
                * LabJcampQuantificationTest.CELL_DENSITY);
        Instant t0 = LabJcampQuantificationTest.T0;
        Path before = write(qa, "cts-before.jdx", cts, t0.minusSeconds(300), "cts", r, lab);
        Path zero = write(qa, "zero.jdx", Map.of(), t0.minusSeconds(200), "zero", r, lab);
        Path after = write(qa, "cts-after.jdx", cts, t0.plusSeconds(8 * 1800), "cts", r, lab);
        lab.ok("import", "--project", "LBK-5", "--file", before.toString(), "--file", zero.toString(), "--file",
                after.toString());
        assertTrue(lab.ok(lab.quantifyArguments().toArray(String[]::new)).contains("Quantified 0 measurement(s)"),
                "the QA measurements are not samples");

        Path plan = Files.writeString(lab.folder.resolve("qa.plan"),
                PLAN + "checks = cts-path, cts-drift, zero-gas, background-age\n");
        String out = lab.ok("qa", "--project", "LBK-5", "--method", "Kiln stack CO and N2O", "--plan",
                plan.toString());
        assertTrue(out.startsWith("QA checks: 7, failed: 0"), out);
        return out;
    }

    /**
     * The method detection limit is on the basis of the results it is compared with. Seven zero-gas readings of a
     * hot cell at low pressure (393.15 K, 80 kPa, against the references' 296 K and 101.325 kPa) are imported as
     * QA measurements, and the same spectra again as samples. Quantify corrects the samples to their cell by
     * (T_s/T_r)(p_r/p_s) = 1.68, the ideal-gas number density ratio (EPA FTIR Protocol section 11.2 as the
     * standards notes give it), and the MDL qa stores must be t(6, 0.99) = 3.143 (40 CFR Part 136 Appendix B's
     * table, as reproduced in Wis. Adm. Code NR 252.0365) times the standard deviation of those corrected sample
     * results, not of the readings as fitted, which would give 1.68 times less.
     */
    @Test
    void theDetectionLimitIsOnTheBasisOfTheCorrectedResults() throws Exception {
        LabJcampQuantificationTest.Lab lab = new LabJcampQuantificationTest.Lab(folder,
                List.of("--workspace", folder.resolve("ws").toString()), 6);
        lab.setUp();
        Path qa = Files.createDirectories(folder.resolve("qa"));
        Random r = new Random(20260506);
        List<String> zeros = new java.util.ArrayList<>(List.of("import", "--project", "LBK-5"));
        List<String> quantify = new java.util.ArrayList<>(lab.quantifyArguments());
        for (int i = 0; i < 7; i++) {
            Spectrum a = lab.spectra.absorbance(Map.of(), 0, 0, NOISE, r);
            Map<String, String> labels = new LinkedHashMap<>();
            labels.put("LONGDATE", LabJcampQuantificationTest.stamp(LabJcampQuantificationTest.T0
                    .minusSeconds(3600 - 60 * i)));
            labels.put("$CELL TEMPERATURE", "393.15");
            labels.put("$CELL PRESSURE", "800.0");
            Path copy = qa.resolve("zero-as-sample-" + i + ".jdx");
            Files.writeString(copy, JcampForms.write(a, "Kiln 5 zero gas as a sample " + i, labels,
                    JcampForms.Form.AFFN));
            quantify.addAll(List.of("--file", copy.toString()));
            labels.put("$ROLE", "zero");
            Path zero = qa.resolve("zero-" + i + ".jdx");
            Files.writeString(zero, JcampForms.write(a, "Kiln 5 zero gas " + i, labels, JcampForms.Form.AFFN));
            zeros.addAll(List.of("--file", zero.toString()));
        }
        lab.ok(zeros.toArray(String[]::new));
        lab.ok(quantify.toArray(String[]::new));
        Path plan = Files.writeString(folder.resolve("qa.plan"), PLAN + "checks = method-detection-limit\n");
        lab.ok("qa", "--project", "LBK-5", "--method", "Kiln stack CO and N2O", "--plan", plan.toString());

        double factor = (393.15 / 296.0) * (101.325 / 80.0);
        try (WorkspaceStore store = Workspaces.openH2(folder.resolve("ws").resolve("db"))) {
            Session ana = store.users().logIn("ana", "lab-pw-12".toCharArray());
            String project = store.projects().findByCode(ana, "LBK-5").orElseThrow().getId();
            Map<String, String> fileOf = store.imports().measurements(ana, project).stream().collect(
                    Collectors.toMap(Measurement::getId, Measurement::getSourceFile));
            Map<String, Double> mdl = store.qa().checks(ana, project).stream().collect(Collectors.toMap(
                    c -> c.getCheck(), c -> c.getMeasured()));
            for (String compound : List.of("CO", "N2O")) {
                List<Result> copies = store.results().results(ana, project).stream()
                        .filter(x -> x.getCompound().equals(compound)
                                && fileOf.get(x.getMeasurementId()).startsWith("zero-as-sample-"))
                        .toList();
                assertEquals(7, copies.size(), compound);
                double[] ppm = new double[copies.size()];
                for (int i = 0; i < ppm.length; i++) {
                    assertEquals(factor, copies.get(i).getConditions().correctionFactor(), 1e-12);
                    ppm[i] = copies.get(i).getConcentration();
                }
                double corrected = 3.143 * sampleStandardDeviation(ppm);
                double stored = mdl.get("Method detection limit " + compound);
                assertEquals(corrected, stored, 2e-4 * corrected, compound);
                assertTrue(Math.abs(stored - corrected / factor) > 0.3 * stored, "the limit as fitted differs");
            }
        }
    }

    /** sqrt(sum (x - mean)^2 / (n - 1)), 40 CFR Part 136 Appendix B's S. */
    private static double sampleStandardDeviation(double[] x) {
        double mean = java.util.Arrays.stream(x).average().orElseThrow();
        double sum = 0;
        for (double v : x) {
            sum += (v - mean) * (v - mean);
        }
        return Math.sqrt(sum / (x.length - 1));
    }

    @Test
    void withoutQaMeasurementsInTheProjectTheCommandSaysWhatIsMissing() throws Exception {
        LabJcampQuantificationTest.Lab lab = new LabJcampQuantificationTest.Lab(folder,
                List.of("--workspace", folder.resolve("ws").toString()), 6);
        lab.setUp();
        lab.ok(lab.quantifyArguments().toArray(String[]::new));
        Path plan = Files.writeString(folder.resolve("qa.plan"), PLAN);
        assertEquals(ExitCode.FAILURE, lab.run("qa", "--project", "LBK-5", "--method", "Kiln stack CO and N2O",
                "--plan", plan.toString()));
        assertTrue(lab.errors().contains("holds no QA measurements") && lab.errors().contains("##$ROLE="),
                lab.errors());
    }
}
