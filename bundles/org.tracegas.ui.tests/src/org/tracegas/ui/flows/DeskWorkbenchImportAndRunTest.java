package org.tracegas.ui.flows;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;

import org.eclipse.core.runtime.IStatus;
import org.eclipse.core.runtime.jobs.IJobChangeEvent;
import org.eclipse.core.runtime.jobs.IJobChangeListener;
import org.eclipse.core.runtime.jobs.Job;
import org.eclipse.core.runtime.jobs.JobChangeAdapter;
import org.eclipse.jface.wizard.WizardDialog;
import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.GC;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Event;
import org.eclipse.swt.widgets.Menu;
import org.eclipse.swt.widgets.MenuItem;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.swtchart.IAxis;
import org.eclipse.ui.IWorkbenchPage;
import org.eclipse.ui.IWorkbenchWindow;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.model.Project;
import org.tracegas.model.Result;
import org.tracegas.model.ResultFlag;
import org.tracegas.store.ResultRow;
import org.tracegas.ui.Screens;
import org.tracegas.ui.dialogs.ImportFilesPage;
import org.tracegas.ui.jobs.FileImportJob;
import org.tracegas.ui.jobs.StoredMethodRunJob;
import org.tracegas.ui.parts.ConcentrationTrace;
import org.tracegas.ui.parts.TimeSeriesPanel;
import org.tracegas.ui.parts.WorkspaceNavigator;
import org.tracegas.ui.session.Desk;
import org.tracegas.ui.views.NavigatorView;

/**
 * The analyst's morning in the started product ({@link StartedWorkbench}) on a real H2 workspace holding only the
 * lab's users, project and method: she logs in, imports the morning's JCAMP-DX files through File → Import… (the
 * wizard names each file's reader and takes the conditions the last file does not state), runs the method on the
 * imported measurements through Analysis → Run method…, whose job she waits for, and reads the values in the time
 * series. The files are written by the importer's JCAMP-DX writer from {@link LimeKilnLab}'s mixtures; the amounts
 * found must be those the files were made with within 3 standard uncertainties.
 */
class DeskWorkbenchImportAndRunTest {

    @TempDir
    Path folder;

    @Test
    void theAnalystImportsTheMorningThroughTheWizardRunsTheMethodAndReadsTheValuesInTheTimeSeries()
            throws Exception {
        List<Path> files;
        try (LabDesk lab = new LabDesk(folder, 800, 600)) {
            files = lab.lab.morning();
        }
        List<Path> shots = new ArrayList<>();
        Map<Job, IStatus> done = new ConcurrentHashMap<>();
        IJobChangeListener jobs = new JobChangeAdapter() {
            @Override
            public void done(IJobChangeEvent event) {
                done.put(event.getJob(), event.getResult());
            }
        };
        Job.getJobManager().addJobChangeListener(jobs);
        try {
            StartedWorkbench.run(folder.resolve("ws"), LimeKilnLab.ANALYST, LimeKilnLab.PASSWORD,
                    (display, window) -> drive(display, window, files, done, shots));
        } finally {
            Job.getJobManager().removeJobChangeListener(jobs);
        }
        assertEquals(3, shots.size());
    }

    private static void drive(Display display, IWorkbenchWindow window, List<Path> files, Map<Job, IStatus> done,
            List<Path> shots) throws Exception {
        Shell shell = window.getShell();
        assertEquals("Tracegas Workbench — " + LimeKilnLab.ANALYST, shell.getText());
        IWorkbenchPage page = window.getActivePage();
        WorkspaceNavigator nav = StartedWorkbench.find(shell, WorkspaceNavigator.class);
        Screens.waitFor(display, () -> LabDesk.project(nav) != null, 30_000);
        assertEquals(0, LabDesk.project(nav).getMeasurements().size(), "nothing imported yet");
        // the project chosen in the tree is the one the wizard imports into
        page.activate(page.findView(NavigatorView.ID));
        assertTrue(nav.openProject(LimeKilnLab.CODE));

        // File → Import…: the wizard is driven while its dialog is open (it is modal: the menu's command waits)
        List<String> wizardRows = new ArrayList<>();
        List<String> wizardProject = new ArrayList<>();
        List<Throwable> failures = new ArrayList<>();
        display.timerExec(300, new Runnable() {
            @Override
            public void run() {
                WizardDialog dialog = openWizard(display);
                if (dialog == null) {
                    display.timerExec(100, this);
                    return;
                }
                try {
                    ImportFilesPage importPage = (ImportFilesPage) dialog.getCurrentPage();
                    importPage.addFiles(files);
                    // s04.jdx states neither its time nor its cell conditions: the lab's log gives them
                    importPage.temperatureField().setText(Double.toString(LimeKilnLab.T_CELL));
                    importPage.pressureField().setText(Double.toString(LimeKilnLab.P_CELL));
                    importPage.timeField().setText(LimeKilnLab.T0.plusSeconds(180).toString());
                    Screens.flush(display);
                    wizardRows.addAll(importPage.rows());
                    wizardProject.add(importPage.project().getCode());
                    shots.add(Screens.save(dialog.getShell(), "workbench-import-wizard"));
                    press(button(dialog.getShell(), "Finish"));
                } catch (Throwable t) {
                    failures.add(t);
                    dialog.close();
                }
            }
        });
        press(menuItem(display, shell, "File", "Import", "org.tracegas.ui.commands.import"));
        assertEquals(List.of(), failures);
        // the JCAMP-DX reader contributed to the importer's extension point, each file's conditions named
        assertEquals(List.of(LimeKilnLab.CODE), wizardProject, "the project chosen in the tree");
        assertEquals(4, wizardRows.size(), wizardRows.toString());
        assertEquals("s01.jdx | JCAMP-DX 4.24 and 5.01 | 1 | stated in the file", wizardRows.get(0));
        assertEquals("s04.jdx | JCAMP-DX 4.24 and 5.01 | 1 | from the values given below", wizardRows.get(3));
        Screens.waitFor(display, () -> finished(done, FileImportJob.class) != null
                && LabDesk.project(nav) != null && LabDesk.project(nav).getMeasurements().size() == 4, 60_000);
        assertEquals("Imported 4 file(s) (4 measurement(s)) into project " + LimeKilnLab.CODE + "; 0 already imported",
                finished(done, FileImportJob.class).getMessage());
        page.activate(page.findView(NavigatorView.ID));
        assertTrue(nav.openProject(LimeKilnLab.CODE));
        nav.viewer().expandAll();
        Screens.flush(display);
        shots.add(Screens.save(shell, "workbench-imported-morning"));

        // Analysis → Run method… on the project chosen in the tree: the workspace's one method, as a job
        assertTrue(nav.openProject(LimeKilnLab.CODE));
        press(menuItem(display, shell, "Analysis", "Run method", "org.tracegas.ui.commands.runMethod"));
        Screens.waitFor(display, () -> finished(done, StoredMethodRunJob.class) != null, 120_000);
        assertEquals("Quantified 4 measurement(s) of project " + LimeKilnLab.CODE + " with method '"
                + LimeKilnLab.METHOD + "' version 1; skipped 0 quantified with it before",
                finished(done, StoredMethodRunJob.class).getMessage());
        TimeSeriesPanel series = StartedWorkbench.find(shell, TimeSeriesPanel.class);
        assertNotNull(series, "the desk shows the time series");
        assertTrue(nav.openProject(LimeKilnLab.CODE));
        // the traces as drawn once they hold the four values: taken inside the wait, since the view reads the
        // store again (and draws nothing meanwhile) when the run's job tells the desk that results were stored
        List<ConcentrationTrace> drawn = new ArrayList<>();
        Screens.waitFor(display, () -> {
            List<ConcentrationTrace> now = series.traces();
            if (now.isEmpty() || now.get(0).values().length != 4
                    || !series.heading().getText().startsWith("Stored results of")) {
                return false;
            }
            drawn.addAll(now);
            return true;
        }, 60_000);

        // the amounts the files were made with (LimeKilnLab's ideal-gas scaling of its reference), within 3
        // standard uncertainties; 150 ppm in the 2 m cell lies beyond the 200 ppm·m reference and is flagged
        Map<Double, Double> madeAt = Map.of(0.0, 40.0, 1.0, 0.0, 2.0, 150.0, 3.0, 60.0);
        Project project = LabDesk.project(nav);
        List<ResultRow> rows = Desk.get().access().store().analyses().rows(Desk.get().session(), project.getId());
        assertEquals(4, rows.size());
        ConcentrationTrace co = drawn.get(0);
        assertEquals("CO", co.compound());
        for (int i = 0; i < rows.size(); i++) {
            ResultRow r = rows.get(i);
            double minute = (r.measured().getEpochSecond() - LimeKilnLab.T0.getEpochSecond()) / 60.0;
            double truth = madeAt.get(minute);
            Result v = r.result();
            assertTrue(Math.abs(v.getConcentration() - truth) <= 3 * v.getStandardUncertainty() + 1e-3 * truth,
                    "minute " + minute + ": " + v.getConcentration() + " ± " + v.getStandardUncertainty()
                            + " ppm, made with " + truth);
            assertEquals(truth > 100, v.getFlags().contains(ResultFlag.ABOVE_CALIBRATED_RANGE), "minute " + minute);
            // the time series draws the stored value, in time order as the rows come
            assertEquals(v.getConcentration(), co.values()[i], 1e-9 * Math.max(1, truth), "minute " + minute);
        }
        assertEquals(1, co.flagged().cardinality(), "the 150 ppm value is drawn flagged");
        shots.add(Screens.save(shell, "workbench-run-method-time-series"));
        StartedWorkbench.assertInside(series);
        // the concentration axis's title is written whole along the plot (its unit alone where words do not fit)
        IAxis left = series.chart().getAxisSet().getYAxis(0);
        GC gc = new GC(series.chart());
        gc.setFont(left.getTitle().getFont());
        int titleLength = gc.textExtent(left.getTitle().getText()).x;
        gc.dispose();
        int plotHeight = series.chart().getPlotArea().getControl().getSize().y;
        assertTrue(titleLength <= plotHeight, "'" + left.getTitle().getText() + "' is " + titleLength
                + " px long, the plot " + plotHeight + " px high");
    }

    /** How the one finished job of a type ended, or null while none has. */
    private static IStatus finished(Map<Job, IStatus> done, Class<? extends Job> type) {
        List<IStatus> of = done.entrySet().stream().filter(e -> type.isInstance(e.getKey())).map(Map.Entry::getValue)
                .toList();
        assertTrue(of.size() <= 1, type.getSimpleName() + " ran " + of.size() + " times");
        return of.isEmpty() ? null : of.get(0);
    }

    /** The import wizard's dialog once it is open, else null. */
    private static WizardDialog openWizard(Display display) {
        for (Shell s : display.getShells()) {
            if (!s.isDisposed() && s.isVisible() && s.getData() instanceof WizardDialog d
                    && d.getCurrentPage() instanceof ImportFilesPage) {
                return d;
            }
        }
        return null;
    }

    /**
     * The item of the window's menu bar whose menu and label start as given, or which bears the id of the command
     * the label names (as a workbench started again in the same runtime labels contributed items); the menu is
     * shown first, as opening it does, so that the workbench fills in the commands contributed to it.
     */
    private static MenuItem menuItem(Display display, Shell shell, String menu, String label, String command) {
        for (MenuItem top : shell.getMenuBar().getItems()) {
            if (!top.getText().replace("&", "").equals(menu)) {
                continue;
            }
            Menu m = top.getMenu();
            List<MenuItem> found = new ArrayList<>();
            try {
                Screens.waitFor(display, () -> {
                    m.notifyListeners(SWT.Show, new Event());
                    for (MenuItem item : m.getItems()) {
                        String text = item.getText().replace("&", "");
                        if (text.startsWith(label) || text.equals(command)) {
                            found.add(item);
                        }
                    }
                    return !found.isEmpty();
                }, 10_000);
            } catch (AssertionError e) {
                fail("menu " + menu + " has no item " + label + ": " + List.of(m.getItems()));
            }
            m.notifyListeners(SWT.Hide, new Event());
            return found.get(0);
        }
        fail("the menu bar has no menu " + menu);
        return null;
    }

    private static Button button(Composite parent, String label) {
        for (Control c : parent.getChildren()) {
            if (c instanceof Button b && b.getText().replace("&", "").equals(label)) {
                return b;
            }
            if (c instanceof Composite k) {
                Button found = button(k, label);
                if (found != null) {
                    return found;
                }
            }
        }
        return null;
    }

    private static void press(org.eclipse.swt.widgets.Widget w) {
        w.notifyListeners(SWT.Selection, new Event());
    }
}
