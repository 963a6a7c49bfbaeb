package org.tracegas.qa.campaign;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Set;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.library.io.FileFormatException;
import org.tracegas.pipeline.MeasurementRole;
import org.tracegas.qa.checks.CheckOutcome;
import org.tracegas.qa.checks.QaCheck;
import org.tracegas.qa.checks.QaCheckRegistry;
import org.tracegas.qa.checks.QaInputs;
import org.tracegas.qa.checks.NoiseCheck;
import org.tracegas.qa.checks.ZeroSpanCheck;

/**
 * The control charts a QA plan file asks for (which repeated readings, the baseline size, and bad blocks) and the
 * checks it names.
 */
class QaPlanTest {

    @TempDir
    Path folder;

    private static final String HEAD = """
            library = lib/library.manifest
            cts-compound = CO
            cts-ppm = 100
            cts-band = 2050..2200
            spike-analyte = HCl
            tracer = SF6
            spike-analyte-ppm = 60
            spike-tracer-ppm = 2
            analytes = CO, NO
            noise-region = 2450..2600
            maximum-noise = 2e-3
            background-age-limit = 24 h
            """;

    private QaPlan read(String charts) throws Exception {
        return QaPlan.read(write(charts));
    }

    /** The plan file with lines after the head (whose 12 lines put a first key there on line 13). */
    private Path write(String tail) throws Exception {
        return Files.writeString(folder.resolve("qa.plan"), HEAD + tail);
    }

    private static List<String> names(QaPlan plan) {
        return plan.checks().stream().map(QaCheck::name).toList();
    }

    /** A check with a setting of its own, as another bundle would contribute it. */
    static final class LineLeakCheck implements QaCheck {

        @Override
        public String name() {
            return "line-leak";
        }

        @Override
        public Set<String> readings() {
            return Set.of(MeasurementRole.ZERO);
        }

        @Override
        public Set<String> settings() {
            return Set.of("leak-limit");
        }

        @Override
        public List<CheckOutcome> evaluate(QaInputs inputs) {
            return List.of();
        }
    }

    @Test
    void chartBlocksNameTheRepeatedReadingsAndTheirBaseline() throws Exception {
        assertTrue(read("").charts().isEmpty(), "charts are optional");
        QaPlan plan = read("""

                [chart]
                readings = Zero CO,  Zero   NO, Noise level
                baseline = 8

                [chart]
                readings = CTS path length
                baseline = 3
                """);
        assertEquals(2, plan.charts().size());
        assertEquals(List.of("Zero CO", "Zero NO", "Noise level"), plan.charts().get(0).readings());
        assertEquals(8, plan.charts().get(0).baselineSize());
        assertEquals(List.of("CTS path length"), plan.charts().get(1).readings());
        assertEquals(3, plan.charts().get(1).baselineSize());

        // a chart's own outcome is told apart from the readings it charts (the check names are the qa bundle's)
        CheckOutcome zero = new ZeroSpanCheck(1.0, 5.0).zero("CO", 0.1);
        CheckOutcome noise = new NoiseCheck(new org.tracegas.qa.checks.AbsorbanceRegion(2450, 2600), 2e-3)
                .evaluate(new double[] { 2450, 2500, 2550, 2600 }, new double[] { 1e-4, -1e-4, 2e-4, 0 });
        List<CheckOutcome> current = List.of(zero, zero, noise, noise);
        QaControlCharts charts = new QaControlCharts(List.of("Zero CO", "Noise level"), 2);
        CheckOutcome chartOutcome = new QaControlCharts(List.of("Zero CO"), 2)
                .evaluate(List.of(new ZeroSpanCheck(1.0, 5.0).zero("CO", 0.0), new ZeroSpanCheck(1.0, 5.0)
                        .zero("CO", 0.2)), current).get(0).outcome();
        assertTrue(charts.isChartOutcome(chartOutcome), chartOutcome.check());
        assertTrue(!charts.isChartOutcome(zero) && !charts.isChartOutcome(noise));
    }

    @Test
    void aChartBlockMayStateTheSigmaOfZeroReadingsWithItsSource() throws Exception {
        QaControlCharts charts = read("""

                [chart]
                readings = Zero CO, Zero NO, Noise level
                baseline = 8
                stated-sigma = Zero NO 0.03 ppm,  Zero   CO 0.05 ppm
                sigma-source = QAL1 report 17-004, repeatability at zero
                """).charts().get(0);
        assertEquals(Map.of("Zero NO", 0.03, "Zero CO", 0.05), charts.statedSigma());
        assertEquals("QAL1 report 17-004, repeatability at zero", charts.sigmaSource());
        assertTrue(read("""

                [chart]
                readings = Noise level
                baseline = 8
                """).charts().get(0).statedSigma().isEmpty());
    }

    @Test
    void badStatedSigmaIsNamedByLineAndKey() {
        // line 17 is the stated-sigma line of the block starting on line 14 (12 head lines and a blank one)
        for (String[] bad : new String[][] { { "Noise level 0.1 ppm", "not a zero reading" },
                { "Zero N2O 0.1 ppm", "not a zero reading" }, { "Zero NO 0.03 mg/m3", "'reading sigma ppm'" },
                { "Zero NO -0.03 ppm", "must be positive" }, { "Zero NO abc ppm", "not a number" },
                { "Zero NO 0.03 ppm, Zero NO 0.04 ppm", "stated twice" } }) {
            FileFormatException e = assertThrows(FileFormatException.class, () -> read("""

                    [chart]
                    readings = Zero CO, Zero NO, Noise level
                    baseline = 8
                    stated-sigma = %s
                    sigma-source = sheet
                    """.formatted(bad[0])));
            assertTrue(e.getMessage().contains("line 17") && e.getMessage().contains("'stated-sigma'")
                    && e.getMessage().contains(bad[1]) && e.getMessage().contains("qa.plan"), e.getMessage());
        }
        FileFormatException missing = assertThrows(FileFormatException.class, () -> read("""

                [chart]
                readings = Zero NO
                baseline = 8
                stated-sigma = Zero NO 0.03 ppm
                """));
        assertTrue(missing.getMessage().contains("line 14") && missing.getMessage().contains("'sigma-source'")
                && missing.getMessage().contains("needs its source"), missing.getMessage());
        FileFormatException orphan = assertThrows(FileFormatException.class, () -> read("""

                [chart]
                readings = Zero NO
                baseline = 8
                sigma-source = sheet
                """));
        assertTrue(orphan.getMessage().contains("line 17") && orphan.getMessage().contains("'sigma-source'"),
                orphan.getMessage());
    }

    @Test
    void badChartBlocksAreNamedByLineAndKey() {
        // line 15 is the readings line of the block starting on line 14 (12 head lines and a blank one)
        FileFormatException unknown = assertThrows(FileFormatException.class, () -> read("""

                [chart]
                readings = Zero CO, Zero SO2
                baseline = 8
                """));
        assertTrue(unknown.getMessage().contains("line 15") && unknown.getMessage().contains("'readings'")
                && unknown.getMessage().contains("Zero SO2"), unknown.getMessage());
        FileFormatException twice = assertThrows(FileFormatException.class, () -> read("""

                [chart]
                readings = Zero CO
                baseline = 8

                [chart]
                readings = Noise level, Zero CO
                baseline = 3
                """));
        assertTrue(twice.getMessage().contains("line 19") && twice.getMessage().contains("charted twice"),
                twice.getMessage());
        FileFormatException small = assertThrows(FileFormatException.class, () -> read("""

                [chart]
                readings = Noise level
                baseline = 1
                """));
        assertTrue(small.getMessage().contains("'baseline'") && small.getMessage().contains("at least 2"),
                small.getMessage());
        FileFormatException key = assertThrows(FileFormatException.class, () -> read("""

                [chart]
                readings = Noise level
                limit = 8
                """));
        assertTrue(key.getMessage().contains("line 16") && key.getMessage().contains("'limit'"), key.getMessage());
    }

    @Test
    void aPlanWithoutChecksEvaluatesTheBuiltInOnesInTheirOrder() throws Exception {
        assertEquals(CampaignQaChecks.BUILT_IN, names(read("")));
        assertEquals(CampaignQaChecks.BUILT_IN, names(QaPlan.read(write(""), CampaignQaChecks.builtIn())));
    }

    @Test
    void aPlanNamesItsChecksInTheOrderTheyAreEvaluated() throws Exception {
        QaPlan plan = QaPlan.read(write("checks = zero-gas, cts-drift\n"), CampaignQaChecks.builtIn());
        assertEquals(List.of("zero-gas", "cts-drift"), names(plan));
    }

    @Test
    void anUnknownCheckNamesFileLineAndTheKnownChecks() throws Exception {
        Path file = write("checks = cts-path, zero-gass\n");
        FileFormatException e = assertThrows(FileFormatException.class,
                () -> QaPlan.read(file, CampaignQaChecks.builtIn()));
        String m = e.getMessage();
        assertTrue(m.contains(file.toString()) && m.contains("line 13") && m.contains("'checks'")
                && m.contains("'zero-gass'") && m.contains(CampaignQaChecks.BUILT_IN.toString()), m);
        FileFormatException twice = assertThrows(FileFormatException.class,
                () -> QaPlan.read(write("checks = cts-path, cts-path\n"), CampaignQaChecks.builtIn()));
        assertTrue(twice.getMessage().contains("line 13") && twice.getMessage().contains("named twice"),
                twice.getMessage());
    }

    @Test
    void aContributedCheckMayReadSettingsOfItsOwnOnlyWhenNamed() throws Exception {
        QaCheckRegistry known = CampaignQaChecks.builtIn().register(new LineLeakCheck());
        QaPlan plan = QaPlan.read(write("checks = zero-gas, line-leak\nleak-limit = 0.5\n"), known);
        assertEquals(List.of("zero-gas", "line-leak"), names(plan));
        assertEquals(0.5, plan.settings().number("leak-limit"), 0.0);
        FileFormatException e = assertThrows(FileFormatException.class,
                () -> QaPlan.read(write("checks = zero-gas\nleak-limit = 0.5\n"), known));
        assertTrue(e.getMessage().contains("line 14") && e.getMessage().contains("unknown key"), e.getMessage());
    }
}
