package org.tracegas.ui.flows;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;

import org.eclipse.core.runtime.jobs.Job;
import org.eclipse.jface.wizard.WizardDialog;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Shell;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.audit.AuditAction;
import org.tracegas.audit.AuditQuery;
import org.tracegas.audit.AuditRecord;
import org.tracegas.importer.ReaderRegistry;
import org.tracegas.model.Measurement;
import org.tracegas.store.ImportedFile;
import org.tracegas.ui.Screens;
import org.tracegas.ui.dialogs.ImportFilesPage;
import org.tracegas.ui.dialogs.ImportWizard;
import org.tracegas.ui.internal.ImportHandler;
import org.tracegas.ui.jobs.FileImportJob;
import org.tracegas.ui.parts.WorkspaceNavigator;
import org.tracegas.ui.session.WorkspaceAccess;
import org.tracegas.ui.views.ViewContents;

/**
 * File → Import… on a real H2 workspace with real JCAMP-DX files: the wizard names the reader of the platform's
 * registry that recognises each file and asks for the conditions a file does not state; the import job stores
 * through the store's import service (kept by SHA-256, audited) and the workspace tree shows the new
 * measurements; importing a file again adds nothing and says so.
 */
class DeskImportTest {

    @TempDir
    Path folder;

    private LabDesk desk;

    @BeforeEach
    void openWorkspace() throws Exception {
        desk = new LabDesk(folder, 640, 600);
    }

    @AfterEach
    void close() {
        desk.close();
    }

    @Test
    void importsTheFilesTheWizardListsAndTheTreeShowsThem() throws Exception {
        Display display = desk.display;
        Shell shell = desk.shell;
        WorkspaceAccess access = desk.access;
        LimeKilnLab lab = desk.lab;
        WorkspaceNavigator nav = ViewContents.navigator(shell);
        shell.open();
        Screens.waitFor(display, () -> LabDesk.project(nav) != null, 20_000);
        assertEquals(0, LabDesk.project(nav).getMeasurements().size());
        List<Path> files = lab.morning();

        ReaderRegistry readers = ReaderRegistry.fromPlatform();
        ImportWizard wizard = new ImportWizard(readers, access.store().projects().projects(lab.analyst), null);
        WizardDialog dialog = new WizardDialog(shell, wizard);
        dialog.setBlockOnOpen(false);
        dialog.open();
        ImportFilesPage page = wizard.page();
        page.addFiles(files);
        Screens.flush(display);
        List<String> rows = page.rows();
        // the JCAMP-DX reader contributed to the importer's extension point (org.tracegas.importer plugin.xml)
        assertEquals("s01.jdx | JCAMP-DX 4.24 and 5.01 | 1 | stated in the file", rows.get(0));
        assertTrue(rows.get(3).startsWith("s04.jdx | JCAMP-DX 4.24 and 5.01 |  | "), rows.get(3));
        assertFalse(page.isPageComplete(), "s04.jdx states no time or cell conditions: " + rows.get(3));
        assertTrue(page.getErrorMessage().startsWith("s04.jdx cannot be imported"), page.getErrorMessage());

        page.temperatureField().setText(Double.toString(LimeKilnLab.T_CELL));
        page.pressureField().setText(Double.toString(LimeKilnLab.P_CELL));
        page.timeField().setText(LimeKilnLab.T0.plusSeconds(180).toString());
        Screens.flush(display);
        assertEquals("s04.jdx | JCAMP-DX 4.24 and 5.01 | 1 | from the values given below", page.rows().get(3));
        assertTrue(page.isPageComplete(), page.getErrorMessage());
        Screens.save(dialog.getShell(), "import-wizard");
        assertTrue(wizard.performFinish());
        dialog.close();

        List<String> reports = new ArrayList<>();
        FileImportJob job = ImportHandler.schedule(wizard.request(), readers, display, reports::add);
        Screens.waitFor(display, () -> !reports.isEmpty() && LabDesk.project(nav) != null
                && LabDesk.project(nav).getMeasurements().size() == 4, 60_000);
        assertEquals("Imported 4 file(s) (4 measurement(s)) into project " + LimeKilnLab.CODE + "; 0 already imported",
                reports.get(0));

        Measurement given = measurementAt(nav, LimeKilnLab.T0.plusSeconds(180));
        assertEquals(LimeKilnLab.T_CELL, given.getCellTemperature(), 0.0);
        assertEquals(LimeKilnLab.P_CELL, given.getCellPressure(), 0.0);
        Measurement labelled = measurementAt(nav, LimeKilnLab.T0);
        assertEquals(LimeKilnLab.T_CELL, labelled.getCellTemperature(), 1e-9, "from the file's ##$CELL TEMPERATURE");

        // kept under the SHA-256 of its bytes (FIPS 180-4, as the JDK computes it)
        String sha = HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(Files.readAllBytes(
                files.get(0))));
        ImportedFile first = access.store().imports().find(lab.analyst, lab.project.getId(), sha).orElseThrow();
        assertEquals("s01.jdx", first.fileName());
        List<AuditRecord> audit = access.store().audit().review(lab.reviewer, AuditQuery.all().objectType("raw-file")
                .build()).records();
        assertEquals(4, audit.size());
        assertTrue(audit.stream().allMatch(r -> r.action() == AuditAction.CREATE
                && r.userId().equals(lab.analyst.userId())));
        assertTrue(audit.stream().anyMatch(r -> r.objectId().equals(lab.project.getId() + "/" + sha)));
        nav.openProject(LimeKilnLab.CODE);
        nav.viewer().expandAll();
        Screens.flush(display);
        Screens.save(shell, "import-navigator");

        // the same bytes again add nothing; a new file is added
        List<String> again = new ArrayList<>();
        ImportHandler.schedule(new ImportWizard.Request(lab.project, List.of(files.get(0),
                lab.writeSample("s05.jdx", 20, 4, true)), wizard.request().defaults()), readers, display,
                again::add);
        Screens.waitFor(display, () -> !again.isEmpty() && LabDesk.project(nav) != null
                && LabDesk.project(nav).getMeasurements().size() == 5, 60_000);
        assertEquals("Imported 1 file(s) (1 measurement(s)) into project " + LimeKilnLab.CODE + "; 1 already imported",
                again.get(0));
        assertEquals(Job.NONE, job.getState());
        assertEquals(5, access.store().audit().review(lab.reviewer, AuditQuery.all().objectType("raw-file").build())
                .records().size());
    }

    private static Measurement measurementAt(WorkspaceNavigator nav, java.time.Instant time) {
        Measurement m = LabDesk.project(nav).getMeasurements().stream().filter(x -> time.equals(x.getTime()))
                .findFirst().orElse(null);
        assertNotNull(m, "no measurement at " + time);
        return m;
    }
}
