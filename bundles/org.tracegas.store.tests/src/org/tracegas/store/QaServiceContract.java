package org.tracegas.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.sql.Connection;
import java.sql.ResultSet;
import java.sql.Statement;
import java.util.List;
import java.util.Set;

import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.tracegas.model.Client;
import org.tracegas.model.ContentVersion;
import org.tracegas.model.Project;
import org.tracegas.model.QaOutcome;
import org.tracegas.model.QaOutcomes;
import org.tracegas.model.Role;
import org.tracegas.model.VersionKind;

/** Storing a campaign's QA checks, on each backend. */
abstract class QaServiceContract {

    private TestBackend backend;
    private WorkspaceStore store;
    private Session analyst;
    private Project project;
    private ContentVersion method;

    abstract TestBackend newBackend() throws Exception;

    @BeforeEach
    void setUp() throws Exception {
        backend = newBackend();
        store = backend.open();
        Session admin = store.users().createFirstAdministrator("admin", "Administrator", "admin-pw-12".toCharArray());
        store.users().createUser(admin, "ana", "Ana Lyst", Set.of(Role.ANALYST), "ana-pw-1234".toCharArray());
        analyst = store.users().logIn("ana", "ana-pw-1234".toCharArray());
        project = store.projects().createProject(analyst, store.projects().createClient(analyst, "Client").getId(),
                "QA-1",
                "QA project");
        method = store.versions().create(analyst, VersionKind.METHOD, "m", "analyte=CO\n", "first");
    }

    @AfterEach
    void tearDown() throws Exception {
        try (TestBackend b = backend) {
            store.close();
        }
    }

    @Test
    void checksComeBackAsStoredWithTheirAuditRecordsAndFreezeTheMethod() throws Exception {
        List<QaOutcome> checks = List.of(
                QaOutcomes.of("Spike recovery HCl", true, 102.3, "%", 70, 130, "70 .. 130 %", "EPA Method 320"),
                QaOutcomes.of("Noise level", false, 0.004, "absorbance", Double.NEGATIVE_INFINITY, 0.002,
                        "RMS <= 0.002", "common practice, no source"));
        store.qa().recordAll(analyst, project.getId(), method.getId(), checks);

        List<QaOutcome> stored = store.qa().checks(analyst, project.getId());
        assertEquals(checks.stream().map(QaServiceContract::values).toList(),
                stored.stream().map(QaServiceContract::values).toList());
        assertTrue(stored.stream().allMatch(c -> c.getMethodVersionId().equals(method.getId())
                && c.getProjectId().equals(project.getId()) && c.getRecordedBy().equals(analyst.userId())));
        assertTrue(checks.stream().allMatch(c -> c.getId() == null), "the outcomes given stay as they were");
        assertTrue(store.versions().version(method.getId()).isFrozen());
        try (Connection c = backend.raw(); Statement s = c.createStatement();
                ResultSet rs = s.executeQuery("SELECT COUNT(*) FROM audit_record WHERE object_type = 'qa-check'")) {
            rs.next();
            assertEquals(2, rs.getLong(1));
        }
        assertTrue(store.verifyAuditTrail().intact());
    }

    @Test
    void anIncompleteOutcomeIsRefusedByNameAndNothingIsStored() throws Exception {
        QaOutcome good = QaOutcomes.of("Zero CO", true, 0.01, "ppm", -0.1, 0.1, "within ±0.1 ppm", "x");
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> store.qa().recordAll(
                analyst, project.getId(), method.getId(),
                List.of(good, QaOutcomes.of("Zero CO", true, 0.01, "ppm", -0.1, 0.1, " ", "x"))));
        assertEquals("rule of a QA check must not be blank (checks[1])", e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> store.qa().recordAll(analyst, project.getId(),
                method.getId(), List.of(QaOutcomes.of("Zero CO", true, 0.01, null, -0.1, 0.1, "r", "x"))));
        assertEquals("unit of a QA check must not be blank (checks[0])", e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> store.qa().recordAll(analyst, project.getId(),
                method.getId(), List.of(QaOutcomes.of("Zero CO", true, 0.01, "ppm", Double.NaN, 0.1, "r", "x"))));
        assertEquals("limits of QA check Zero CO must be numbers (checks[0])", e.getMessage());

        assertTrue(store.qa().checks(analyst, project.getId()).isEmpty());
        assertFalse(store.versions().version(method.getId()).isFrozen(), "a refused outcome froze nothing");
        try (Connection c = backend.raw(); Statement s = c.createStatement();
                ResultSet rs = s.executeQuery("SELECT COUNT(*) FROM audit_record WHERE object_type = 'qa-check'")) {
            rs.next();
            assertEquals(0, rs.getLong(1));
        }
    }

    /** What an outcome says, without what the store gives it when recording it. */
    private static List<Object> values(QaOutcome c) {
        return List.of(c.getCheck(), c.isPassed(), c.getMeasured(), c.getUnit(), c.getLowerLimit(),
                c.getUpperLimit(), c.getRule(), c.getSource());
    }
}
