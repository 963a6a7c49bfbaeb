package org.tracegas.runner.commands;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The lab's day of JCAMP-DX files carried to the report: samples quantified, QA files judged, then the report of
 * the CO and N2O method, which measures no water, so that the plan states the stack gas moisture (water = none)
 * and the report prints that value, its uncertainty and the plan line it came from. On the embedded workspace and
 * on the PostgreSQL lab server.
 */
class LabJcampReportTest {

    /** Stated moisture of the kiln's stack gas, % vol, and O2 of the side channel, % vol on wet gas. */
    static final double MOISTURE_PERCENT = 8.5;
    static final double O2_WET_PERCENT = 9.0;
    static final String PLAN = """
            report-id = R-LBK-5-1
            client = Lakeside Brick Works
            plant = Kiln 5
            source = Kiln 5 stack
            first-day = 2026-05-04
            last-day = 2026-05-04
            issued = 2026-05-06T00:00:00Z
            standard-temperature = 273.15
            standard-pressure = 101.3
            reference-o2 = 11
            o2-guard = 20
            o2-file = o2.csv
            o2-channel = O2
            o2-uncertainty = 0.2
            water = none
            moisture = 8.5
            moisture-uncertainty = 1.5
            cell-temperature = 313.15
            cell-pressure = 100.9
            reference-uncertainty = 0.02
            path-uncertainty = 0.02
            temperature-uncertainty = 1
            pressure-uncertainty = 0.5
            periods = 30 min

            [compound]
            name = CO
            molar-mass = 28.010
            limit = 500 per 30 min

            [compound]
            name = N2O
            molar-mass = 44.013
            """;

    @TempDir
    Path folder;

    @Test
    void labsJcampDayEndsInAReportOnTheEmbeddedWorkspace() throws Exception {
        reportOfTheDay(new LabJcampQuantificationTest.Lab(folder,
                List.of("--workspace", folder.resolve("ws").toString()), 8));
    }

    @Test
    void labsJcampDayEndsInAReportOnTheLabServer() throws Exception {
        LabJcampQuantificationTest.onLabServer((schemaUrl, user, password) -> reportOfTheDay(
                new LabJcampQuantificationTest.Lab(folder, List.of("--server", schemaUrl, "--user", user), 8)));
    }

    private static void reportOfTheDay(LabJcampQuantificationTest.Lab lab) throws Exception {
        lab.setUp();
        LabJcampQaTest.qaOfTheDay(lab);
        StringBuilder o2 = new StringBuilder("time,O2\nUTC,%vol\n");
        for (int i = 0; i < 8; i++) {
            o2.append(LabJcampQuantificationTest.T0.plusSeconds(1800L * i)).append(',').append(O2_WET_PERCENT)
                    .append('\n');
        }
        Files.writeString(lab.folder.resolve("o2.csv"), o2);
        Path plan = Files.writeString(lab.folder.resolve("lab-report.plan"), PLAN);
        Path out = lab.folder.resolve("report-LBK-5");

        String printed = lab.ok("report", "--project", "LBK-5", "--method", "Kiln stack CO and N2O", "--plan",
                plan.toString(), "--out", out.toString());
        String hash = printed.lines().filter(l -> l.startsWith("Content hash (SHA-256): "))
                .map(l -> l.substring("Content hash (SHA-256): ".length())).findFirst()
                .orElseThrow(() -> new AssertionError("no content hash in " + printed));
        assertEquals(64, hash.length(), printed);
        assertTrue(Files.isRegularFile(out.resolve("report.pdf")), printed);
        String text;
        try (PDDocument doc = Loader.loadPDF(out.resolve("report.pdf").toFile())) {
            text = new PDFTextStripper().getText(doc).replaceAll("\\s+", " ");
        }
        assertTrue(text.contains(hash), "the content hash printed is the report's");
        assertTrue(text.contains("R-LBK-5-1") && text.contains("Kiln stack CO and N2O") && text.contains("v1"),
                "report id, method and its version");
        assertTrue(text.contains("all 7 QA readings passed"), text);
        for (String check : List.of("CTS path length", "CTS drift", "Noise level", "Zero CO", "Zero N2O",
                "Background age")) {
            assertTrue(text.contains(check), "QA outcome " + check);
        }
        int moistureLine = Files.readAllLines(plan).indexOf("moisture = 8.5") + 1;
        assertTrue(text.contains("Moisture of the dry basis: 8.5 % vol (standard uncertainty 1.5 % vol), stated in "
                + "report plan lab-report.plan, line " + moistureLine + ", not measured"), text);
        assertTrue(text.contains("mg/m³ dry gas, 273.15 K, 101.3 kPa, 11 % O2"), "the basis");

        // The first sample's CO on the basis against its made amount converted by hand: ideal-gas molar volume
        // V_m = R T / p with R = 8.314462618 J/(mol K) (CODATA 2018, exact since the 2019 SI), dry gas
        // c_dry = c_wet / (1 - h2o) (common practice, no source), and the oxygen reference
        // E_ref = E_meas (21 - O2_ref) / (21 - O2_meas) on dry gas (Directive 2010/75/EU Annex VI Part 2, from
        // memory). The tolerance is the quantification's (LabJcampQuantificationTest): 3 % plus 0.3 ppm.
        double ppm = lab.truthByFile.get("stack-01.jdx").get("CO");
        double h2o = MOISTURE_PERCENT / 100;
        double o2Dry = O2_WET_PERCENT / (1 - h2o);
        double perPpm = 28.010 / (8.314462618 * 273.15 / 101.3) / (1 - h2o) * (21 - 11) / (21 - o2Dry);
        List<String> csv = Files.readAllLines(out.resolve("results.csv"), StandardCharsets.UTF_8);
        String row = csv.stream().filter(l -> l.startsWith("CO,") && l.contains(
                LabJcampQuantificationTest.T0.toString())).findFirst()
                .orElseThrow(() -> new AssertionError("no CO row of the first half hour in " + csv));
        assertEquals(ppm * perPpm, Double.parseDouble(row.split(",")[3]), (0.03 * ppm + 0.3) * perPpm, row);
    }
}
