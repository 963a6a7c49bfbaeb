package org.tracegas.installation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.time.Instant;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.audit.AuditQuery;
import org.tracegas.audit.AuditRecord;
import org.tracegas.store.AuditService;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;
import org.tracegas.store.Workspaces;

class InstalledSoftwareTest {

    @TempDir
    Path dir;

    private static final Addon READER = new Addon("org.example.lab.reader.feature", "1.0.0.202612010800");

    @Test
    void theDescriptionNamesTheReleaseAndEachAddonWithItsVersion() {
        assertEquals("Tracegas Workbench 0.1.0.1",
                new InstalledSoftware("/opt/tracegas", "Tracegas Workbench 0.1.0.1", List.of(), List.of()).description());
        assertEquals("Tracegas Workbench 0.1.0.1 with org.example.lab.reader.feature 1.0.0.202612010800, "
                + "org.example.lab.step.feature 2.1.0", new InstalledSoftware("/opt/tracegas",
                        "Tracegas Workbench 0.1.0.1",
                        List.of(READER, new Addon("org.example.lab.step.feature", "2.1.0")), List.of()).description());
    }

    @Test
    void resultsNameALongAddonListByCountAndDigestWithinTheirColumn() {
        InstalledSoftware one = new InstalledSoftware("/opt/tracegas", "Tracegas Workbench 0.1.0.1", List.of(READER),
                List.of());
        assertEquals(one.description(), one.resultSoftware(), "fits: named in full");
        InstalledSoftware three = new InstalledSoftware("/opt/tracegas", "Tracegas Workbench 0.1.0.1",
                List.of(READER, new Addon("org.example.lab.step.feature", "2.1.0"),
                        new Addon("org.example.lab.check.feature", "3.0.0")), List.of());
        assertEquals(154, three.description().length());
        // digest: `printf %s '<description>' | sha256sum` (GNU coreutils), first 16 hex digits
        assertEquals("Tracegas Workbench 0.1.0.1 with 3 add-ons #2b97cdcb204383dc", three.resultSoftware());
        assertTrue(three.resultSoftware().length() <= InstalledSoftware.RESULT_SOFTWARE_LENGTH);
        assertTrue(three.reason().contains("results name it \"" + three.resultSoftware() + "\""), three.reason());
    }

    @Test
    void theTestRuntimeIsNoInstallationThatP2Manages() throws Exception {
        assertTrue(InstalledSoftware.running().isEmpty());
        assertEquals("fallback", InstalledSoftware.describeRunning("fallback"));
    }

    @Test
    void anInstalledAddonIsRecordedInTheAuditTrailWithWhoInstalledItAndWhen() {
        AddonChange install = new AddonChange(Instant.parse("2026-12-01T08:00:00Z"), "labadmin", "install",
                READER.id(), "file:/srv/addons");
        InstalledSoftware plain = new InstalledSoftware("/opt/tracegas", "Tracegas Workbench 0.1.0.1", List.of(),
                List.of());
        InstalledSoftware withReader = new InstalledSoftware("/opt/tracegas", "Tracegas Workbench 0.1.0.1",
                List.of(READER), List.of(install));
        try (WorkspaceStore store = Workspaces.openH2(dir.resolve("db"))) {
            Session admin = store.users().createFirstAdministrator("admin", "Administrator",
                    "admin-pw-12".toCharArray());
            assertTrue(plain.recordIn(store, admin));
            assertFalse(plain.recordIn(store, admin), "opened again with the same software");
            assertTrue(withReader.recordIn(store, admin));

            List<AuditRecord> records = store.audit().review(admin,
                    AuditQuery.all().object(AuditService.SOFTWARE_OBJECT, "/opt/tracegas").build()).records();
            assertEquals(2, records.size());
            AuditRecord change = records.get(1);
            assertEquals(plain.description(), change.oldValue());
            assertEquals(withReader.description(), change.newValue());
            assertTrue(change.reason().contains(
                    "2026-12-01T08:00:00Z labadmin install org.example.lab.reader.feature from file:/srv/addons"),
                    change.reason());
        }
    }
}
