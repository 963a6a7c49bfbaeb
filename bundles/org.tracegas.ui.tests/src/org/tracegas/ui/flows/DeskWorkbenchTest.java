package org.tracegas.ui.flows;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.concurrent.atomic.AtomicReference;

import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.GC;
import org.eclipse.swt.graphics.Image;
import org.eclipse.swt.graphics.ImageData;
import org.eclipse.swt.graphics.Rectangle;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Event;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.ui.IWorkbenchPage;
import org.eclipse.ui.IWorkbenchWindow;
import org.eclipse.ui.PlatformUI;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.audit.AuditAction;
import org.tracegas.ui.Screens;
import org.tracegas.ui.dialogs.LoginDialog;
import org.tracegas.ui.internal.DeskWorkbenchAdvisor;
import org.tracegas.ui.parts.AuditTrailPanel;
import org.tracegas.ui.parts.ConcentrationTrace;
import org.tracegas.ui.parts.SpectrumPanel;
import org.tracegas.ui.parts.TimeSeriesPanel;
import org.tracegas.ui.parts.WorkspaceNavigator;
import org.tracegas.ui.session.Desk;
import org.tracegas.ui.session.WorkspaceAccess;
import org.tracegas.ui.session.WorkspaceLocation;
import org.tracegas.ui.views.AuditTrailView;

/**
 * The product's workbench, started as the application starts it (log-in dialog, then
 * {@link PlatformUI#createAndRunWorkbench} with the product's advisor: the analysis desk, its menus and views
 * from plugin.xml), on a real H2 workspace holding a quantified morning: the reviewer logs in, opens the project
 * in the tree, opens a value's spectrum from the time series and reads the audit trail.
 */
class DeskWorkbenchTest {

    @TempDir
    Path folder;

    @Test
    void aReviewerLogsInOpensTheProjectOpensASpectrumFromTheTimeSeriesAndReadsTheAuditTrail() throws Exception {
        try (LabDesk lab = new LabDesk(folder, 800, 600)) {
            lab.quantifiedMorning();
        }
        Display display = Display.getDefault();
        WorkspaceAccess access = WorkspaceAccess.openExisting(new WorkspaceLocation.Folder(folder.resolve("ws")));
        try {
            Shell parent = new Shell(display);
            LoginDialog login = new LoginDialog(parent, access.store().users(), access.location().description());
            login.setBlockOnOpen(false);
            login.open();
            login.loginField().setText(LimeKilnLab.REVIEWER);
            login.passwordField().setText(LimeKilnLab.PASSWORD);
            login.okButton().notifyListeners(SWT.Selection, new Event());
            assertNotNull(login.session(), "the reviewer is logged in");
            parent.dispose();
            Desk.get().start(access, login.session(), null);

            AtomicReference<Throwable> failure = new AtomicReference<>();
            List<Path> shots = new ArrayList<>();
            Runnable[] whenOpen = new Runnable[1];
            whenOpen[0] = () -> {
                if (!PlatformUI.isWorkbenchRunning()
                        || PlatformUI.getWorkbench().getActiveWorkbenchWindow() == null) {
                    display.timerExec(200, whenOpen[0]);
                    return;
                }
                try {
                    drive(display, PlatformUI.getWorkbench().getActiveWorkbenchWindow(), shots);
                } catch (Throwable t) {
                    failure.set(t);
                } finally {
                    PlatformUI.getWorkbench().close();
                }
            };
            display.timerExec(200, whenOpen[0]);
            int code = PlatformUI.createAndRunWorkbench(display, new DeskWorkbenchAdvisor(LimeKilnLab.REVIEWER));
            if (failure.get() != null) {
                throw new AssertionError("driving the workbench failed", failure.get());
            }
            assertEquals(PlatformUI.RETURN_OK, code);
            assertEquals(2, shots.size());
        } finally {
            access.close();
        }
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
        // the first row's strip: the table's client coordinates start below its header
        int colours = coloursOnScreen(display, audit.table(),
                new Rectangle(0, 0, audit.table().getClientArea().width, audit.table().getItemHeight()));
        // a painted row holds anti-aliased text (hundreds of colours); an unpainted one is background and a grid
        // line or two
        assertTrue(colours > 20, "the first row of the audit trail is painted: " + colours + " colours on screen");
    }

    /** How many colours the screen shows in {@code area} (control coordinates, clipped to 600 pixels wide). */
    private static int coloursOnScreen(Display display, Control control, Rectangle area) {
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

    /** The first control of a type below a composite, depth first. */
    private static <T extends Control> T find(Composite parent, Class<T> type) {
        for (Control c : parent.getChildren()) {
            if (type.isInstance(c)) {
                return type.cast(c);
            }
            if (c instanceof Composite k) {
                T found = find(k, type);
                if (found != null) {
                    return found;
                }
            }
        }
        return null;
    }
}
