package org.tracegas.ui.flows;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;

import org.eclipse.swt.layout.FillLayout;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Shell;
import org.tracegas.importer.ReaderRegistry;
import org.tracegas.model.Project;
import org.tracegas.model.VersionKind;
import org.tracegas.pipeline.FileMeasurements;
import org.tracegas.ui.Screens;
import org.tracegas.ui.dialogs.ImportWizard;
import org.tracegas.ui.internal.ImportHandler;
import org.tracegas.ui.internal.RunMethodHandler;
import org.tracegas.ui.parts.WorkspaceNavigator;
import org.tracegas.ui.session.Desk;
import org.tracegas.ui.session.WorkspaceAccess;

/**
 * The desk on {@link LimeKilnLab}'s real H2 workspace, signed in as its analyst (no demo model: the views read
 * the store), with a window to show the views in.
 */
final class LabDesk implements AutoCloseable {

    final Display display = Display.getDefault();
    final Shell shell = new Shell(display);
    final WorkspaceAccess access;
    final LimeKilnLab lab;

    LabDesk(Path folder, int width, int height) throws Exception {
        this(folder, width, height, 0);
    }

    /** @param waterPpm the stack's moisture, which the lab's method then measures as well (0: neither) */
    LabDesk(Path folder, int width, int height, double waterPpm) throws Exception {
        access = WorkspaceAccess.openH2(folder.resolve("ws"));
        lab = new LimeKilnLab(access.store(), folder, waterPpm);
        Desk.get().start(access, lab.analyst);
        shell.setText("Tracegas Workbench — " + LimeKilnLab.ANALYST);
        shell.setLayout(new FillLayout());
        shell.setSize(width, height);
    }

    /** The lab's project as the tree shows it, or null while the tree is being read. */
    static Project project(WorkspaceNavigator nav) {
        if (nav.workspace() == null) {
            return null;
        }
        return nav.workspace().getClients().stream().flatMap(c -> c.getProjects().stream())
                .filter(p -> p.getCode().equals(LimeKilnLab.CODE)).findFirst().orElse(null);
    }

    /**
     * Imports the lab's morning (conditions given for the file without) through the desk's import job, waiting
     * for it.
     *
     * @return the import's closing message, in a list the caller may add to
     */
    List<String> importedMorning() throws Exception {
        List<String> reports = new ArrayList<>();
        ImportHandler.schedule(new ImportWizard.Request(lab.project, lab.morning(), new FileMeasurements.Defaults(
                null, LimeKilnLab.T0.plusSeconds(180), LimeKilnLab.T_CELL, LimeKilnLab.P_CELL)),
                ReaderRegistry.fromPlatform(), display, reports::add);
        Screens.waitFor(display, () -> reports.size() == 1, 60_000);
        return reports;
    }

    /**
     * Imports the lab's morning and runs the stored method over all of it, through the desk's jobs, waiting for
     * both.
     *
     * @return the closing messages of the import and of the run
     */
    List<String> quantifiedMorning() throws Exception {
        List<String> reports = importedMorning();
        RunMethodHandler.schedule(RunMethodHandler.target(access.store(), lab.project,
                access.store().versions().latest(VersionKind.METHOD).get(0)), Set.of(), display, reports::add);
        Screens.waitFor(display, () -> reports.size() == 2, 120_000);
        return reports;
    }

    @Override
    public void close() {
        shell.dispose();
        access.close();
    }
}
