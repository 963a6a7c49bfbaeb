package org.tracegas.campaign;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;

import org.eclipse.core.runtime.IExtensionRegistry;
import org.eclipse.core.runtime.RegistryFactory;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.importer.StandaloneExtensions;
import org.tracegas.library.io.FileFormatException;
import org.tracegas.qa.checks.CheckOutcome;
import org.tracegas.qa.checks.QaCheck;
import org.tracegas.qa.checks.QaCheckRegistry;
import org.tracegas.qa.checks.QaInputs;

/** The QA checks a plan names: the built-in ones come through the extension point, unknown names are refused. */
class CampaignQaChecksTest {

    @TempDir
    Path folder;

    /** Twelve lines, so that a "checks" key appended to it is on line 13. */
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

    private Path plan(String tail) throws Exception {
        return Files.writeString(folder.resolve("qa.plan"), HEAD + tail);
    }

    private static List<String> names(QaPlan plan) {
        return plan.checks().stream().map(QaCheck::name).toList();
    }

    @Test
    void theBuiltInChecksAreContributedThroughTheExtensionPoint() throws Exception {
        IExtensionRegistry running = RegistryFactory.getRegistry();
        IExtensionRegistry extensions = running != null ? running
                : StandaloneExtensions.fromSourceTree(getClass().getClassLoader(), "org.tracegas.qa",
                        "org.tracegas.campaign");
        QaCheckRegistry contributed = QaCheckRegistry.fromExtensions(extensions);
        assertEquals(CampaignQaChecks.BUILT_IN, CampaignQaChecks.builtIn().names());
        assertTrue(contributed.names().containsAll(CampaignQaChecks.BUILT_IN), contributed.names().toString());
        for (String name : CampaignQaChecks.BUILT_IN) {
            assertEquals(CampaignQaChecks.builtIn().find(name).orElseThrow().getClass(),
                    contributed.find(name).orElseThrow().getClass(), name);
        }
    }

    @Test
    void aPlanWithoutChecksEvaluatesTheBuiltInOnesInTheirOrder() throws Exception {
        assertEquals(CampaignQaChecks.BUILT_IN, names(QaPlan.read(plan(""))));
        assertEquals(CampaignQaChecks.BUILT_IN, names(QaPlan.read(plan(""), CampaignQaChecks.builtIn())));
    }

    @Test
    void aPlanNamesItsChecksInTheOrderTheyAreEvaluated() throws Exception {
        QaPlan plan = QaPlan.read(plan("checks = zero-gas, cts-drift\n"), CampaignQaChecks.builtIn());
        assertEquals(List.of("zero-gas", "cts-drift"), names(plan));
    }

    @Test
    void anUnknownCheckNamesFileLineAndTheKnownChecks() throws Exception {
        Path file = plan("checks = cts-path, zero-gass\n");
        FileFormatException e = assertThrows(FileFormatException.class,
                () -> QaPlan.read(file, CampaignQaChecks.builtIn()));
        String m = e.getMessage();
        assertTrue(m.contains(file.toString()) && m.contains("line 13") && m.contains("'checks'")
                && m.contains("'zero-gass'") && m.contains(CampaignQaChecks.BUILT_IN.toString()), m);
        FileFormatException twice = assertThrows(FileFormatException.class,
                () -> QaPlan.read(plan("checks = cts-path, cts-path\n"), CampaignQaChecks.builtIn()));
        assertTrue(twice.getMessage().contains("line 13") && twice.getMessage().contains("named twice"),
                twice.getMessage());
    }

    @Test
    void aContributedCheckMayReadSettingsOfItsOwnOnlyWhenNamed() throws Exception {
        QaCheckRegistry known = CampaignQaChecks.builtIn().register(new LineLeakCheck());
        QaPlan plan = QaPlan.read(plan("checks = zero-gas, line-leak\nleak-limit = 0.5\n"), known);
        assertEquals(List.of("zero-gas", "line-leak"), names(plan));
        assertEquals(0.5, plan.settings().number("leak-limit"), 0.0);
        FileFormatException e = assertThrows(FileFormatException.class,
                () -> QaPlan.read(plan("checks = zero-gas\nleak-limit = 0.5\n"), known));
        assertTrue(e.getMessage().contains("line 14") && e.getMessage().contains("unknown key"), e.getMessage());
    }
}
