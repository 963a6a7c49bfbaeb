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

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.runner.ExitCode;

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

    private static Path write(Path dir, String name, Map<String, Double> ppmMetres, Instant time, String role,
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
