package org.tracegas.report.campaign;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.library.io.FileFormatException;

/**
 * The moisture of the dry basis as a report plan gives it: the method's water result by name, or, where the method
 * measures no water, a stated volume fraction with its uncertainty, whose origin (plan file and line) the report
 * prints. Errors name the file, line and key.
 */
class ReportPlanTest {

    @TempDir
    Path folder;

    /** A plan whose water line is replaced by the given lines. */
    private Path plan(String waterLines) throws Exception {
        return Files.writeString(folder.resolve("lab-report.plan"), PLAN.replace("water = H2O\n", waterLines),
                StandardCharsets.UTF_8);
    }

    /** A whole plan of an invented brick works, naming plant and source. */
    static final String PLAN = """
            report-id = R-2026-044
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
            water = H2O
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
            """;

    private static int lineOf(Path file, String start) throws Exception {
        return Files.readAllLines(file).stream().takeWhile(l -> !l.startsWith(start)).toList().size() + 1;
    }

    @Test
    void aPlanNamesTheMethodsWaterResult() throws Exception {
        Moisture m = ReportPlan.read(plan("water = H2O\n")).moisture();
        assertFalse(m.isStated());
        assertEquals("H2O", m.compound());
    }

    @Test
    void aStatedMoistureCarriesItsValueUncertaintyAndOrigin() throws Exception {
        Path file = plan("water = none\nmoisture = 8.5\nmoisture-uncertainty = 1.5\n");
        Moisture m = ReportPlan.read(file).moisture();
        assertTrue(m.isStated());
        assertEquals(8.5, m.statedPercent());
        assertEquals(1.5, m.statedUncertaintyPercent());
        String statement = m.statement();
        assertTrue(statement.contains("8.5 % vol") && statement.contains("1.5 % vol")
                && statement.contains("report plan lab-report.plan, line " + lineOf(file, "moisture ="))
                && statement.contains("not measured"), statement);
    }

    @Test
    void aMissingOrImpossibleMoistureIsNamedByFileLineAndKey() throws Exception {
        Path missing = plan("water = none\nmoisture-uncertainty = 1.5\n");
        FileFormatException e = assertThrows(FileFormatException.class, () -> ReportPlan.read(missing));
        assertTrue(e.getMessage().contains("lab-report.plan") && e.getMessage().contains("'moisture'"),
                e.getMessage());

        Path tooWet = plan("water = none\nmoisture = 100\nmoisture-uncertainty = 1.5\n");
        e = assertThrows(FileFormatException.class, () -> ReportPlan.read(tooWet));
        assertTrue(e.getMessage().contains("lab-report.plan") && e.getMessage().contains("line "
                + lineOf(tooWet, "moisture =")) && e.getMessage().contains("'moisture'"), e.getMessage());

        Path negative = plan("water = none\nmoisture = 8.5\nmoisture-uncertainty = -1\n");
        e = assertThrows(FileFormatException.class, () -> ReportPlan.read(negative));
        assertTrue(e.getMessage().contains("line " + lineOf(negative, "moisture-uncertainty"))
                && e.getMessage().contains("'moisture-uncertainty'"), e.getMessage());
    }

    @Test
    void aStatedMoistureBesideAMeasuredOneIsRefused() throws Exception {
        Path both = plan("water = H2O\nmoisture = 8.5\n");
        FileFormatException e = assertThrows(FileFormatException.class, () -> ReportPlan.read(both));
        assertTrue(e.getMessage().contains("line " + lineOf(both, "moisture =")) && e.getMessage().contains(
                "'moisture'") && e.getMessage().contains("water = none"), e.getMessage());
    }
}
