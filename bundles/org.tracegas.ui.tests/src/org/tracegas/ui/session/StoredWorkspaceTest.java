package org.tracegas.ui.session;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.temporal.ChronoUnit;

import org.eclipse.core.runtime.NullProgressMonitor;
import org.eclipse.jface.viewers.IStructuredSelection;
import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.SashForm;
import org.eclipse.swt.layout.FillLayout;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.swt.widgets.TreeItem;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.model.AnalysisMethod;
import org.tracegas.model.Project;
import org.tracegas.model.Workspace;
import org.tracegas.store.Session;
import org.tracegas.ui.Screens;
import org.tracegas.ui.parts.TimeSeriesPanel;
import org.tracegas.ui.parts.WorkspaceNavigator;

/**
 * A workspace that already has users and data, reopened from its H2 files and shown in the navigator as a
 * signed-in user sees it.
 */
class StoredWorkspaceTest {

    @TempDir
    Path folder;

    private Display display;
    private Shell shell;
    private ExistingWorkspace written;
    private WorkspaceAccess access;

    @BeforeEach
    void writeAndReopen() {
        try (WorkspaceAccess first = WorkspaceAccess.openH2(folder)) {
            written = new ExistingWorkspace(first.store());
        }
        access = WorkspaceAccess.openH2(folder);
        display = Display.getDefault();
        shell = new Shell(display);
        shell.setLayout(new FillLayout());
        shell.setSize(1200, 700);
    }

    @AfterEach
    void close() {
        shell.dispose();
        access.close();
    }

    private Session logIn(String login) {
        return access.store().users().logIn(login, ExistingWorkspace.PASSWORD.toCharArray());
    }

    @Test
    void navigatorShowsTheProjectsOfTheSignedInUserWithTheirMeasurementsAndStoredResults() throws Exception {
        Session analyst = logIn(ExistingWorkspace.ANALYST);
        SashForm sash = new SashForm(shell, SWT.HORIZONTAL);
        WorkspaceNavigator nav = new WorkspaceNavigator(sash, SWT.NONE);
        TimeSeriesPanel series = new TimeSeriesPanel(sash, SWT.NONE);
        sash.setWeights(2, 3);
        nav.setWorkspace(StoredWorkspace.load(access.store(), analyst, "existing", new NullProgressMonitor()));
        shell.open();
        Screens.flush(display);

        TreeItem[] top = nav.viewer().getTree().getItems();
        // one client the analyst may read, then the library and method headings
        assertEquals(3, top.length);
        assertEquals("Riverside Incinerator", top[0].getText());
        assertEquals(1, top[0].getItemCount());
        TreeItem project = top[0].getItem(0);
        assertEquals("RIV-2026-05  Line 2 stack, May campaign  (231 measurements)", project.getText());

        assertTrue(nav.openProject(ExistingWorkspace.CODE));
        Screens.flush(display);
        Project selected = (Project) ((IStructuredSelection) nav.viewer().getSelection()).getFirstElement();
        assertEquals(written.project.getId(), selected.getId());
        // one day, its samples and its background apart; all fit on the first page, in time order; then the
        // project's work batch, named by its units and its start, to the second in UTC (ISO 8601 with a space)
        nav.viewer().expandToLevel(selected, 3);
        Screens.flush(display);
        assertEquals(2, project.getItemCount());
        assertEquals("work batch of 3 units  " + written.batch.getCreatedAt().truncatedTo(ChronoUnit.SECONDS)
                .toString().replace('T', ' ').replace("Z", " UTC"), project.getItem(1).getText());
        TreeItem day = project.getItem(0);
        assertEquals("2026-05-04", day.getText());
        assertEquals(2, day.getItemCount());
        TreeItem samples = day.getItem(0);
        assertEquals("sample", samples.getText());
        assertEquals(230, samples.getItemCount());
        assertEquals("sample  2026-05-04 06:00:00 UTC", samples.getItem(0).getText());
        assertEquals("sample  2026-05-04 09:49:00 UTC", samples.getItem(229).getText());
        assertEquals("background", day.getItem(1).getText());
        assertEquals("background  2026-05-04 05:55:00 UTC", day.getItem(1).getItem(0).getText());
        // newest versions from the store; recording the results froze the method version
        assertEquals("Reference libraries", top[1].getText());
        nav.viewer().expandAll();
        assertEquals("Stack references", top[1].getItem(0).getText());
        assertEquals("Stack CO and NO", top[2].getItem(0).getText());
        // that version holds no method text the runner could run; the model says so instead of hiding it
        AnalysisMethod unreadable = ((Workspace) nav.viewer().getInput()).getMethods().get(0);
        assertTrue(unreadable.getDescription().startsWith("version 1 cannot be read: "), unreadable.getDescription());
        assertTrue(unreadable.getVersions().get(0).getRegions().isEmpty());
        assertEquals("version 1 (frozen)", top[2].getItem(0).getItem(0).getText());
        nav.viewer().collapseAll();
        assertTrue(nav.openProject(ExistingWorkspace.CODE));

        StoredResults.Traces traces = StoredResults.traces(access.store(), analyst, selected.getId(),
                new NullProgressMonitor());
        series.show(StoredResults.title(selected.getCode(), traces), traces.traces(), java.util.List.of());
        assertEquals(3, series.shownPoints("CO"));
        assertEquals(1, series.shownPoints("NO flagged"));
        Path shot = Screens.save(shell, "existing-workspace-navigator");
        assertTrue(Files.size(shot) > 0);
    }

    @Test
    void aUserWithoutGrantsSeesNoClientsAndNoProjects() {
        Workspace w = StoredWorkspace.load(access.store(), logIn(ExistingWorkspace.REVIEWER), "existing",
                new NullProgressMonitor());
        assertTrue(w.getClients().isEmpty());
        Workspace admin = StoredWorkspace.load(access.store(), logIn("admin"), "existing",
                new NullProgressMonitor());
        // the administrator created both projects and so holds a write grant on each
        assertEquals(java.util.List.of("Northern Paper Mill", "Riverside Incinerator"),
                admin.getClients().stream().map(c -> c.getName()).toList());
        assertEquals(ExistingWorkspace.HIDDEN_CODE, admin.getClients().get(0).getProjects().get(0).getCode());
    }
}
