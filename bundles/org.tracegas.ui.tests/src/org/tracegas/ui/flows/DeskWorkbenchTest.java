package org.tracegas.ui.flows;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.GC;
import org.eclipse.swt.graphics.Image;
import org.eclipse.swt.graphics.ImageData;
import org.eclipse.swt.graphics.Point;
import org.eclipse.swt.graphics.Rectangle;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Event;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.ui.IWorkbenchPage;
import org.eclipse.ui.IWorkbenchWindow;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.audit.AuditAction;
import org.tracegas.model.VersionKind;
import org.tracegas.ui.Screens;
import org.tracegas.ui.parts.AuditTrailPanel;
import org.tracegas.ui.parts.ConcentrationTrace;
import org.tracegas.ui.parts.MethodEditorPanel;
import org.tracegas.ui.parts.SpectrumPanel;
import org.tracegas.ui.parts.TimeSeriesPanel;
import org.tracegas.ui.parts.WorkspaceNavigator;
import org.tracegas.ui.session.Desk;
import org.tracegas.ui.views.AuditTrailView;

/**
 * The product's workbench, started as the application starts it ({@link StartedWorkbench}), on a real H2
 * workspace holding a quantified morning: the reviewer logs in, opens the project in the tree, opens a value's
 * spectrum from the time series and reads the audit trail.
 */
class DeskWorkbenchTest {

    @TempDir
    Path folder;

    @Test
    void aReviewerLogsInOpensTheProjectOpensASpectrumFromTheTimeSeriesAndReadsTheAuditTrail() throws Exception {
        try (LabDesk lab = new LabDesk(folder, 800, 600)) {
            lab.quantifiedMorning();
        }
        List<Path> shots = new ArrayList<>();
        StartedWorkbench.run(folder.resolve("ws"), LimeKilnLab.REVIEWER, LimeKilnLab.PASSWORD,
                (display, window) -> drive(display, window, shots));
        assertEquals(3, shots.size());
    }

    private static void drive(Display display, IWorkbenchWindow window, List<Path> shots) throws Exception {
        Shell shell = window.getShell();
        assertEquals("Tracegas Workbench — " + LimeKilnLab.REVIEWER, shell.getText());
        WorkspaceNavigator nav = find(shell, WorkspaceNavigator.class);
        Screens.waitFor(display, () -> LabDesk.project(nav) != null, 30_000);
        assertTrue(nav.openProject(LimeKilnLab.CODE));

        TimeSeriesPanel series = find(shell, TimeSeriesPanel.class);
        Screens.waitFor(display, () -> series.heading().getText().startsWith("Stored results of"), 30_000);
        ConcentrationTrace co = series.traces().get(0);
        // the value of 07:02, made with 150 ppm and flagged (see LimeKilnLab)
        Event click = new Event();
        click.x = series.chart().getAxisSet().getXAxis(0).getPixelCoordinate(co.hours()[2]);
        click.y = series.chart().getAxisSet().getYAxis(0).getPixelCoordinate(co.values()[2]) + 2;
        click.button = 1;
        series.chart().getPlotArea().getControl().notifyListeners(SWT.MouseDoubleClick, click);
        SpectrumPanel spectrum = find(shell, SpectrumPanel.class);
        Screens.waitFor(display, () -> spectrum.shown() != null, 30_000);
        String title = spectrum.shown().title();
        assertTrue(title.startsWith("CO value at 2026-12-03 07:02"), title);
        assertTrue(title.contains("ABOVE_CALIBRATED_RANGE"), title);
        shots.add(Screens.save(shell, "workbench-spectrum-from-time-series"));

        // the method beside the spectrum, a region's span edited: the form and the comparison fit the narrow view
        MethodEditorPanel method = find(shell, MethodEditorPanel.class);
        method.openStored(Desk.get().access().store().versions().latest(VersionKind.METHOD).get(0).getId());
        method.upperField().setText("2230");
        assertEquals("1 field differs (highlighted).", method.comparison().summary().getText());
        Screens.flush(display);
        StartedWorkbench.assertInside(method);
        shots.add(Screens.save(shell, "workbench-method-1280x800"));

        IWorkbenchPage page = window.getActivePage();
        // in its place on the desk, not maximized: its rows must paint there too
        page.showView(AuditTrailView.ID);
        AuditTrailPanel audit = find(shell, AuditTrailPanel.class);
        Screens.waitFor(display, () -> audit.shown() != null, 30_000);
        assertTrue(audit.shown().chain().intact(), audit.shown().chain().findings().toString());
        assertTrue(audit.shown().records().stream().anyMatch(r -> r.action() == AuditAction.LOGIN
                && r.userId().equals(Desk.get().session().userId())), "the reviewer's log-in is recorded");
        assertTrue(audit.shown().records().stream().anyMatch(r -> r.objectType().equals("raw-file")));
        assertEquals(audit.shown().records().size(), audit.table().getItemCount());
        shots.add(Screens.save(shell, "workbench-audit-trail"));
        // the product's window on the smallest screen it is made for; the trail's records keep room for rows
        assertEquals(new Point(1280, 800), shell.getSize());
        StartedWorkbench.assertInside(audit);
        int rows = audit.table().getClientArea().height / audit.table().getItemHeight();
        assertTrue(rows >= 3, "the audit trail shows " + rows + " rows at 1280×800");
        // the first row's strip: the table's client coordinates start below its header
        int colours = coloursOnScreen(display, audit.table(),
                new Rectangle(0, 0, audit.table().getClientArea().width, audit.table().getItemHeight()));
        // a painted row holds anti-aliased text (hundreds of colours); an unpainted one is background and a grid
        // line or two
        assertTrue(colours > 20, "the first row of the audit trail is painted: " + colours + " colours on screen");
    }

    /** How many colours the screen shows in {@code area} (control coordinates, clipped to 600 pixels wide). */
    static int coloursOnScreen(Display display, Control control, Rectangle area) {
        Rectangle onScreen = display.map(control, null, area);
        int width = Math.min(onScreen.width, 600);
        Image image = new Image(display, width, onScreen.height);
        GC gc = new GC(display);
        try {
            gc.copyArea(image, onScreen.x, onScreen.y);
        } finally {
            gc.dispose();
        }
        ImageData pixels = image.getImageData();
        image.dispose();
        Set<Integer> colours = new HashSet<>();
        for (int y = 0; y < pixels.height; y++) {
            for (int x = 0; x < pixels.width; x++) {
                colours.add(pixels.getPixel(x, y));
            }
        }
        return colours.size();
    }

    private static <T extends Control> T find(Composite parent, Class<T> type) {
        return StartedWorkbench.find(parent, type);
    }
}
