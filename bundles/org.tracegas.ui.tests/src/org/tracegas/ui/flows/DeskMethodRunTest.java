package org.tracegas.ui.flows;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Set;

import org.eclipse.jface.viewers.StructuredSelection;
import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.SashForm;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Shell;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.model.Measurement;
import org.tracegas.model.Project;
import org.tracegas.model.Result;
import org.tracegas.model.ResultFlag;
import org.tracegas.model.VersionKind;
import org.tracegas.store.ResultRow;
import org.tracegas.ui.Screens;
import org.tracegas.ui.internal.RunMethodHandler;
import org.tracegas.ui.internal.TreeChoice;
import org.tracegas.ui.parts.ConcentrationTrace;
import org.tracegas.ui.parts.TimeSeriesPanel;
import org.tracegas.ui.parts.WorkspaceNavigator;
import org.tracegas.ui.session.WorkspaceAccess;
import org.tracegas.ui.views.TimeSeriesView;
import org.tracegas.ui.views.ViewContents;

/**
 * Analysis → Run method on measurements chosen in the tree, on a real H2 workspace: the stored method version
 * runs through the runner's quantification service, results are stored with their flags, a second run over the
 * whole project skips what was quantified and says how many, and the time series shows the stored results.
 */
class DeskMethodRunTest {

    @TempDir
    Path folder;

    private LabDesk desk;

    @BeforeEach
    void openWorkspace() throws Exception {
        desk = new LabDesk(folder, 1280, 800);
    }

    @AfterEach
    void close() {
        desk.close();
    }

    @Test
    void runsTheStoredMethodOnTheChosenMeasurementsThenSkipsThemAndTheTimeSeriesShowsTheResults()
            throws Exception {
        Display display = desk.display;
        Shell shell = desk.shell;
        WorkspaceAccess access = desk.access;
        LimeKilnLab lab = desk.lab;
        SashForm columns = new SashForm(shell, SWT.HORIZONTAL);
        WorkspaceNavigator nav = ViewContents.navigator(columns);
        TimeSeriesView series = ViewContents.timeSeries(columns);
        columns.setWeights(1, 3);
        shell.open();
        List<String> reports = desk.importedMorning();
        Screens.waitFor(display, () -> LabDesk.project(nav) != null
                && LabDesk.project(nav).getMeasurements().size() == 4, 60_000);

        // the first and the third measurement of the morning, chosen in the tree
        Project p = LabDesk.project(nav);
        List<Measurement> byTime = p.getMeasurements().stream()
                .sorted((a, b) -> a.getTime().compareTo(b.getTime())).toList();
        nav.viewer().setSelection(new StructuredSelection(List.of(byTime.get(0), byTime.get(2))));
        Set<String> chosen = Set.copyOf(TreeChoice.measurementIds(nav.viewer().getSelection(), lab.project));
        assertEquals(2, chosen.size());
        series.selected(null, new StructuredSelection(p));
        var version = access.store().versions().latest(VersionKind.METHOD).get(0);
        RunMethodHandler.schedule(RunMethodHandler.target(access.store(), lab.project, version), chosen, display,
                reports::add);
        Screens.waitFor(display, () -> reports.size() == 2 && shownValues(series) == 2, 120_000);
        assertEquals("Quantified 2 measurement(s) of project " + LimeKilnLab.CODE + " with method '"
                + LimeKilnLab.METHOD + "' version 1; skipped 0 quantified with it before", reports.get(1));

        // the whole project: the two quantified before are skipped
        nav.viewer().setSelection(new StructuredSelection(LabDesk.project(nav)));
        Set<String> all = Set.copyOf(TreeChoice.measurementIds(nav.viewer().getSelection(), lab.project));
        assertEquals(4, all.size());
        RunMethodHandler.schedule(RunMethodHandler.target(access.store(), lab.project, version), all, display,
                reports::add);
        Screens.waitFor(display, () -> reports.size() == 3 && shownValues(series) == 4, 120_000);
        assertEquals("Quantified 2 measurement(s) of project " + LimeKilnLab.CODE + " with method '"
                + LimeKilnLab.METHOD + "' version 1; skipped 2 quantified with it before", reports.get(2));

        // the amounts the files were made with, by the ideal gas law (see LimeKilnLab), within 3 standard
        // uncertainties; 150 ppm in the 2 m cell is beyond the 200 ppm·m reference, and flagged so
        Map<Double, Double> madeAt = Map.of(0.0, 40.0, 1.0, 0.0, 2.0, 150.0, 3.0, 60.0);
        List<ResultRow> rows = access.store().analyses().rows(lab.analyst, lab.project.getId());
        assertEquals(4, rows.size());
        for (ResultRow r : rows) {
            double minute = (r.measured().getEpochSecond() - LimeKilnLab.T0.getEpochSecond()) / 60.0;
            double truth = madeAt.get(minute);
            Result v = r.result();
            assertTrue(Math.abs(v.getConcentration() - truth) <= 3 * v.getStandardUncertainty() + 1e-3 * truth,
                    "minute " + minute + ": " + v.getConcentration() + " ± " + v.getStandardUncertainty()
                            + " ppm, made with " + truth);
            assertEquals(truth > 100, v.getFlags().contains(ResultFlag.ABOVE_CALIBRATED_RANGE),
                    "minute " + minute + ": " + v.getFlags());
        }
        TimeSeriesPanel panel = ViewContents.panel(series);
        ConcentrationTrace co = panel.traces().get(0);
        assertEquals("CO", co.compound());
        assertEquals(1, co.flagged().cardinality(), "the 150 ppm value is drawn flagged");
        Screens.save(shell, "method-run-time-series");
    }

    private static int shownValues(TimeSeriesView series) {
        List<ConcentrationTrace> traces = ViewContents.panel(series).traces();
        return traces.isEmpty() ? 0 : traces.get(0).values().length;
    }
}
