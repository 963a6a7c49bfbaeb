package org.tracegas.importer.example;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.time.Duration;
import java.time.Instant;
import java.util.List;
import java.util.Map;

import org.eclipse.core.runtime.IExtensionRegistry;
import org.eclipse.core.runtime.RegistryFactory;
import org.junit.jupiter.api.Test;
import org.tracegas.importer.StandaloneExtensions;
import org.tracegas.qa.checks.CheckOutcome;
import org.tracegas.qa.checks.QaCheck;
import org.tracegas.qa.checks.QaCheckRegistry;
import org.tracegas.qa.checks.QaInputs;
import org.tracegas.qa.checks.QaReading;
import org.tracegas.qa.checks.QaReference;
import org.tracegas.qa.checks.QaSettings;
import org.tracegas.spectrum.Spectrum;

/**
 * The example's leak check as the workbench finds it: contributed through the extension point and looked up by
 * the name a QA plan gives it. Expected rates follow the leak-check formula %VL = (dP/Pb) x 100 over 1 min with
 * the < 4 % limit of the EPA field-test checklist (nepis.epa.gov, Dockey 9100AWUC; standards notes, section 1).
 */
class CellLeakCheckTest {

    private static final Instant SEALED = Instant.parse("2026-03-14T06:40:00Z");

    /** A reading of the sealed cell: only its time and pressure matter to the check. */
    private record SealedCell(Instant time, double cellPressureKPa) implements QaReading {

        @Override
        public String role() {
            return CellLeakCheck.ROLE;
        }

        @Override
        public Spectrum absorbance() {
            throw new UnsupportedOperationException("the leak check reads no spectrum");
        }

        @Override
        public double cellTemperatureK() {
            return 293.15;
        }

        @Override
        public double ppm(String compound) {
            throw new IllegalArgumentException("no gas in the evacuated cell");
        }

        @Override
        public double detectionLimit(String compound) {
            throw new IllegalArgumentException("no gas in the evacuated cell");
        }

        @Override
        public double standardUncertainty(String compound) {
            throw new IllegalArgumentException("no gas in the evacuated cell");
        }
    }

    /** The plan's barometric pressure and the readings of the sealed cell. */
    private record Inputs(double barometricKPa, List<QaReading> sealed) implements QaInputs {

        @Override
        public List<QaReading> readings(String role) {
            return role.equals(CellLeakCheck.ROLE) ? sealed : List.of();
        }

        @Override
        public List<Instant> backgrounds() {
            return List.of();
        }

        @Override
        public Instant backgroundBefore(Instant time) {
            throw new IllegalArgumentException("no background");
        }

        @Override
        public Instant firstSample() {
            return SEALED;
        }

        @Override
        public Instant lastSample() {
            return SEALED;
        }

        @Override
        public double nominalPathMetres() {
            return 10.0;
        }

        @Override
        public QaSettings settings() {
            Map<String, String> plan = Map.of("barometric-pressure", Double.toString(barometricKPa));
            return new QaSettings() {
                @Override
                public boolean has(String key) {
                    return plan.containsKey(key);
                }

                @Override
                public String text(String key) throws IOException {
                    String v = plan.get(key);
                    if (v == null) {
                        throw new IOException("qa.plan, field '" + key + "': missing");
                    }
                    return v;
                }

                @Override
                public double number(String key) throws IOException {
                    return Double.parseDouble(text(key));
                }

                @Override
                public List<String> words(String key) throws IOException {
                    return List.of(text(key).split(","));
                }

                @Override
                public double[] range(String key) throws IOException {
                    throw new IOException("no ranges in this plan");
                }

                @Override
                public Duration duration(String key) throws IOException {
                    throw new IOException("no durations in this plan");
                }
            };
        }

        @Override
        public QaReference reference(String compound, double ppmMetres) throws IOException {
            throw new IOException("no library");
        }
    }

    private static QaCheck lookedUp() throws IOException {
        IExtensionRegistry running = RegistryFactory.getRegistry();
        IExtensionRegistry extensions = running != null ? running
                : StandaloneExtensions.fromSourceTree(CellLeakCheckTest.class.getClassLoader(), "org.tracegas.qa",
                        "org.tracegas.importer.example");
        QaCheckRegistry registry = QaCheckRegistry.fromExtensions(extensions);
        assertTrue(registry.names().contains("cell-leak"), registry.names().toString());
        return registry.find("cell-leak").orElseThrow();
    }

    private static CheckOutcome rate(double fromKPa, double toKPa, int seconds) throws IOException {
        List<QaReading> sealed = List.of(new SealedCell(SEALED, fromKPa),
                new SealedCell(SEALED.plusSeconds(seconds), toKPa));
        List<CheckOutcome> outcomes = lookedUp().evaluate(new Inputs(101.3, sealed));
        assertEquals(1, outcomes.size());
        return outcomes.get(0);
    }

    @Test
    void aSlowRiseOfTheSealedCellPasses() throws Exception {
        // 1.0 kPa in 1 min at 101.3 kPa: 1.0 / 101.3 x 100 = 0.9872 % (hand-computed from the checklist formula)
        CheckOutcome slow = rate(2.0, 3.0, 60);
        assertEquals(0.9872, slow.measured(), 5e-5);
        assertTrue(slow.passed());
        assertEquals("Cell leak rate", slow.check());
        assertTrue(slow.rule().source().contains("9100AWUC"), slow.rule().source());
        // 5.0 kPa over 2 min: 2.5 / 101.3 x 100 = 2.4679 % per minute
        assertEquals(2.4679, rate(2.0, 7.0, 120).measured(), 5e-5);
    }

    @Test
    void aFastRiseFailsTheFourPercentLimit() throws Exception {
        // 5.0 kPa in 1 min: 5.0 / 101.3 x 100 = 4.9358 %, above the checklist's 4 %
        CheckOutcome fast = rate(2.0, 7.0, 60);
        assertEquals(4.9358, fast.measured(), 5e-5);
        assertFalse(fast.passed());
        assertEquals(4.0, fast.limits().upper(), 0.0);
    }

    @Test
    void withoutTwoReadingsOfTheSealedCellThereIsNoOutcome() throws Exception {
        assertTrue(lookedUp().evaluate(new Inputs(101.3, List.of(new SealedCell(SEALED, 2.0)))).isEmpty());
    }
}
