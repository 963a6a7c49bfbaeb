package org.tracegas.ui.views;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.Set;

import org.eclipse.jface.viewers.StructuredSelection;
import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.SashForm;
import org.eclipse.swt.layout.FillLayout;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Event;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.swt.widgets.TableItem;
import org.eclipse.swt.widgets.TreeItem;
import org.eclipse.swtchart.Range;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.model.Client;
import org.tracegas.model.Project;
import org.tracegas.store.Session;
import org.tracegas.ui.Screens;
import org.tracegas.ui.parts.TimeSeriesPanel;
import org.tracegas.ui.parts.WorkspaceNavigator;
import org.tracegas.ui.session.Desk;
import org.tracegas.ui.session.WorkspaceAccess;

/**
 * The navigator and time-series views as the desk opens them (without the workbench site, which needs the
 * running workbench), on a day of one-minute measurements written by the store into a real H2 workspace:
 * the tree is read in a background job, measurements are listed a page at a time, and the compounds drawn
 * follow the list, with the major components on their own axis.
 */
class DeskViewsTest {

    /** Written once: both tests only read it, and writing a day of results takes seconds. */
    @TempDir
    static Path folder;
    private static CampaignDay day;

    private Display display;
    private Shell shell;
    private WorkspaceAccess access;
    private NavigatorView navigatorView;
    private TimeSeriesView seriesView;

    @BeforeAll
    static void writeWorkspace() {
        long start = System.nanoTime();
        try (WorkspaceAccess first = WorkspaceAccess.openH2(folder)) {
            day = new CampaignDay(first.store());
        }
        System.out.printf("writing %d measurements with 5 results each: %.0f ms%n", CampaignDay.MINUTES,
                (System.nanoTime() - start) / 1e6);
    }

    @BeforeEach
    void openWorkspace() {
        access = WorkspaceAccess.openH2(folder);
        Session analyst = access.store().users().logIn(CampaignDay.ANALYST, CampaignDay.PASSWORD.toCharArray());
        Desk.get().start(access, analyst);
        display = Display.getDefault();
        shell = new Shell(display);
        shell.setText("Tracegas Workbench — " + CampaignDay.ANALYST);
        shell.setLayout(new FillLayout());
        shell.setSize(1280, 760);
    }

    @AfterEach
    void close() {
        shell.dispose();
        access.close();
    }

    private WorkspaceNavigator openViews() {
        SashForm sash = new SashForm(shell, SWT.HORIZONTAL);
        navigatorView = new NavigatorView();
        seriesView = new TimeSeriesView();
        long start = System.nanoTime();
        WorkspaceNavigator nav = navigatorView.createContent(sash);
        double blockedMs = (System.nanoTime() - start) / 1e6;
        seriesView.createContent(sash);
        sash.setWeights(3, 7);
        // nothing has run in the event loop yet, so the read's result cannot have arrived
        assertNull(nav.workspace());
        assertEquals("Reading the local workspace in " + folder.toAbsolutePath() + " …",
                nav.viewer().getTree().getItem(0).getText());
        shell.open();
        long waitStart = System.nanoTime();
        Screens.waitFor(display, () -> nav.workspace() != null, 30_000);
        System.out.printf("navigator: UI thread busy %.1f ms creating the view; tree filled by the job after"
                + " %.0f ms%n", blockedMs, (System.nanoTime() - waitStart) / 1e6);
        return nav;
    }

    /** What the page's selection service does when the navigator's selection changes. */
    private void select(WorkspaceNavigator nav, Object element) {
        nav.viewer().setSelection(new StructuredSelection(element), true);
        seriesView.selected(null, nav.viewer().getSelection());
    }

    private static Project project(WorkspaceNavigator nav, String code) {
        for (Client c : nav.workspace().getClients()) {
            for (Project p : c.getProjects()) {
                if (p.getCode().equals(code)) {
                    return p;
                }
            }
        }
        throw new AssertionError("no project " + code);
    }

    private static void check(TimeSeriesPanel panel, String compound, boolean checked) {
        for (TableItem item : panel.compoundList().getItems()) {
            if (compound.equals(item.getData())) {
                item.setChecked(checked);
                Event e = new Event();
                e.item = item;
                e.detail = SWT.CHECK;
                panel.compoundList().notifyListeners(SWT.Selection, e);
                return;
            }
        }
        throw new AssertionError("no compound " + compound + " in the list");
    }

    @Test
    void theNavigatorFillsInTheBackgroundAndListsADayOfMeasurementsAPageAtATime() throws Exception {
        WorkspaceNavigator nav = openViews();
        TreeItem client = nav.viewer().getTree().getItem(0);
        assertEquals("Eastfield Cement", client.getText());
        assertEquals("KLN-2026-07  Kiln 1 stack, July day  (1440 measurements)", client.getItem(0).getText());

        assertTrue(nav.openProject(CampaignDay.CODE));
        Screens.flush(display);
        TreeItem projectItem = client.getItem(0);
        // grouped by day (UTC) and kind: one day of samples
        assertEquals(1, projectItem.getItemCount());
        TreeItem dayItem = projectItem.getItem(0);
        assertEquals("2026-07-14", dayItem.getText());
        nav.viewer().expandToLevel(dayItem.getData(), 1);
        Screens.flush(display);
        assertEquals(1, dayItem.getItemCount());
        TreeItem samples = dayItem.getItem(0);
        assertEquals("sample", samples.getText());
        WorkspaceNavigator.KindGroup group = (WorkspaceNavigator.KindGroup) samples.getData();
        nav.viewer().expandToLevel(group, 1);
        Screens.flush(display);
        // one page of 500, then the node standing for the other 940
        assertEquals(WorkspaceNavigator.PAGE + 1, samples.getItemCount());
        assertEquals("sample  2026-07-14 00:00:00 UTC", samples.getItem(0).getText());
        assertEquals("sample  2026-07-14 08:19:00 UTC", samples.getItem(499).getText());
        TreeItem more = samples.getItem(500);
        assertEquals("… 940 more measurements (expand for the next 500)", more.getText());

        // the user expands the node, as with a click on its arrow
        Event expand = new Event();
        expand.item = more;
        nav.viewer().getTree().notifyListeners(SWT.Expand, expand);
        Screens.waitFor(display, () -> samples.getItemCount() == 2 * WorkspaceNavigator.PAGE + 1, 5_000);
        assertEquals("sample  2026-07-14 08:20:00 UTC", samples.getItem(500).getText());
        assertEquals("… 440 more measurements (expand for the next 440)", samples.getItem(1000).getText());
        Screens.save(shell, "desk-views-navigator-pages");

        nav.showMore(group);
        Screens.flush(display);
        assertEquals(CampaignDay.MINUTES, samples.getItemCount(), "all pages shown, no node for more");
        assertEquals("sample  2026-07-14 23:59:00 UTC", samples.getItem(CampaignDay.MINUTES - 1).getText());
    }

    @Test
    void choosingCompoundsChangesTheSeriesDrawnAndMajorComponentsGetTheirOwnAxis() throws Exception {
        WorkspaceNavigator nav = openViews();
        TimeSeriesPanel panel = (TimeSeriesPanel) ((SashForm) shell.getChildren()[0]).getChildren()[1];
        Project big = project(nav, CampaignDay.CODE);
        Project small = project(nav, CampaignDay.SMALL_CODE);
        assertEquals(day.project.getId(), big.getId());
        assertEquals(day.small.getId(), small.getId());

        // two selections in a row: the read for the first is overtaken and must not show
        select(nav, small);
        select(nav, big);
        assertTrue(panel.heading().getText().startsWith("Reading the stored results of " + CampaignDay.CODE),
                panel.heading().getText());
        long start = System.nanoTime();
        Screens.waitFor(display, () -> panel.heading().getText().startsWith("Stored results of"), 30_000);
        System.out.printf("stored results of %d measurements x 5 compounds shown %.0f ms after the selection%n",
                CampaignDay.MINUTES, (System.nanoTime() - start) / 1e6);
        // give a late delivery of the first read every chance to arrive; it must be dropped
        long until = System.currentTimeMillis() + 500;
        Screens.waitFor(display, () -> System.currentTimeMillis() > until, 5_000);
        assertEquals("Stored results of KLN-2026-07 from 2026-07-14 00:00 UTC", panel.heading().getText());
        // clock time on the axis, not hours from a start: the day is one calendar day in UTC
        org.eclipse.swtchart.IAxis time = panel.chart().getAxisSet().getXAxis(0);
        assertEquals("Time (UTC) on 2026-07-14", time.getTitle().getText());
        assertEquals("06:30", time.getTick().getFormat().format(6.5));

        assertEquals(List.of("CO", "NO", "N2O", "H2O", "CO2"), panel.compounds());
        // at first the trace gases only; water vapour and CO2 are percent-level, major components
        assertEquals(Set.copyOf(CampaignDay.TRACE), panel.selectedCompounds());
        assertEquals("H2O  (major)", panel.compoundList().getItem(3).getText());
        int width = panel.chart().getPlotArea().getSize().x;
        for (String c : CampaignDay.TRACE) {
            int shown = panel.shownPoints(c);
            assertTrue(shown > 0 && shown <= 2 * width + 2, c + ": " + shown);
        }
        assertEquals(0, panel.shownPoints("H2O"));
        assertNull(panel.chart().getSeriesSet().getSeries("H2O"));
        // flags stay shown: NO values 0, 97, ..., 1358 carry one, 15 in all
        assertEquals(15, panel.shownPoints("NO flagged"));
        assertNull(panel.majorAxis());
        Range traceOnly = panel.chart().getAxisSet().getYAxis(0).getRange();
        assertTrue(traceOnly.upper < 200, "trace gases alone span up to NO's 145 ppm: " + traceOnly);
        Screens.save(shell, "desk-views-trace-gases");

        check(panel, "H2O", true);
        check(panel, "CO2", true);
        assertEquals(Set.of("CO", "NO", "N2O", "H2O", "CO2"), panel.selectedCompounds());
        assertNotNull(panel.majorAxis());
        assertTrue(panel.onMajorAxis("H2O"));
        assertTrue(panel.onMajorAxis("CO2"));
        assertFalse(panel.onMajorAxis("CO"));
        assertTrue(panel.shownPoints("H2O") > 0);
        Range left = panel.chart().getAxisSet().getYAxis(0).getRange();
        Range right = panel.majorAxis().getRange();
        // the trace gases keep their scale; the right axis spans H2O's 87,000 to CO2's 192,000 ppm
        assertEquals(traceOnly.lower, left.lower, 1e-9);
        assertEquals(traceOnly.upper, left.upper, 1e-9);
        assertTrue(right.lower < 87_000 && right.upper > 192_000, right.toString());
        assertEquals("Trace gases (ppm)", panel.chart().getAxisSet().getYAxis(0).getTitle().getText());
        assertEquals("Major components, dashed (ppm)", panel.majorAxis().getTitle().getText());
        Screens.save(shell, "desk-views-all-compounds");

        check(panel, "CO", false);
        assertNull(panel.chart().getSeriesSet().getSeries("CO"));
        assertEquals(0, panel.shownPoints("CO"));
        check(panel, "NO", false);
        check(panel, "N2O", false);
        // major components alone need no second axis
        assertNull(panel.majorAxis());
        assertEquals("Concentration (ppm)", panel.chart().getAxisSet().getYAxis(0).getTitle().getText());
        assertTrue(panel.shownPoints("CO2") > 0);
    }
}
