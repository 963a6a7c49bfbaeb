package org.tracegas.ui.views;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.util.HexFormat;

import org.eclipse.jface.viewers.StructuredSelection;
import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.SashForm;
import org.eclipse.swt.layout.FillLayout;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Event;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.swt.widgets.TableItem;
import org.eclipse.swt.widgets.TreeItem;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.model.Client;
import org.tracegas.model.Measurement;
import org.tracegas.model.Project;
import org.tracegas.model.ReferenceLibrary;
import org.tracegas.model.ReferenceOrigin;
import org.tracegas.model.ReferenceSpectrum;
import org.tracegas.store.Session;
import org.tracegas.ui.Screens;
import org.tracegas.ui.parts.Caution;
import org.tracegas.ui.parts.ConcentrationTrace;
import org.tracegas.ui.parts.LibraryBrowserPanel;
import org.tracegas.ui.parts.QaOverviewPanel;
import org.tracegas.ui.parts.ResultReviewPanel;
import org.tracegas.ui.parts.SpectrumPanel;
import org.tracegas.ui.parts.TimeSeriesPanel;
import org.tracegas.ui.parts.WorkspaceNavigator;
import org.tracegas.ui.session.Desk;
import org.tracegas.ui.session.WorkspaceAccess;

/**
 * The spectrum, QA and review views on a workspace the desk did not make (no demo model): everything they show
 * comes from the store through its services, following what is selected in the workspace tree.
 */
class StoredProjectViewsTest {

    @TempDir
    Path folder;

    private Display display;
    private Shell shell;
    private WorkspaceAccess access;
    private StoredProject stored;
    private WorkspaceNavigator nav;
    private SpectrumView spectrumView;
    private QaOverviewView qaView;
    private ResultReviewView reviewView;
    private LibraryView libraryView;
    private TimeSeriesView seriesView;

    @BeforeEach
    void openWorkspace() throws Exception {
        try (WorkspaceAccess first = WorkspaceAccess.openH2(folder)) {
            stored = new StoredProject(first.store(), folder);
        }
        access = WorkspaceAccess.openH2(folder);
        Session analyst = access.store().users().logIn(StoredProject.ANALYST, StoredProject.PASSWORD.toCharArray());
        Desk.get().start(access, analyst);
        display = Display.getDefault();
        shell = new Shell(display);
        shell.setText("Tracegas Workbench — " + StoredProject.ANALYST);
        shell.setLayout(new GridLayout(1, false));
        // the smallest screen the desk is made for
        shell.setSize(1280, 800);
        SashForm columns = new SashForm(shell, SWT.HORIZONTAL);
        columns.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
        // the window's status line, where the desk puts the caution once
        Composite status = new Composite(shell, SWT.NONE);
        status.setLayout(new FillLayout());
        status.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
        Caution.statusItem().fill(status);
        nav = new NavigatorView().createContent(columns);
        SashForm rows = new SashForm(columns, SWT.VERTICAL);
        spectrumView = new SpectrumView();
        spectrumView.createContent(rows);
        seriesView = new TimeSeriesView();
        seriesView.createContent(rows);
        SashForm tables = new SashForm(rows, SWT.HORIZONTAL);
        qaView = new QaOverviewView();
        qaView.createContent(tables);
        reviewView = new ResultReviewView();
        reviewView.createContent(tables);
        libraryView = new LibraryView();
        libraryView.createContent(tables);
        columns.setWeights(1, 3);
        rows.setWeights(3, 3, 3);
        shell.open();
        Screens.waitFor(display, () -> nav.workspace() != null, 30_000);
    }

    @AfterEach
    void close() {
        shell.dispose();
        access.close();
    }

    /** What the page's selection service does when the navigator's selection changes. */
    private void select(Object element) {
        nav.viewer().setSelection(new StructuredSelection(element), true);
        spectrumView.selected(null, nav.viewer().getSelection());
        qaView.selected(null, nav.viewer().getSelection());
        reviewView.selected(null, nav.viewer().getSelection());
        libraryView.selected(null, nav.viewer().getSelection());
        seriesView.selected(null, nav.viewer().getSelection());
    }

    private Project project() {
        for (Client c : nav.workspace().getClients()) {
            for (Project p : c.getProjects()) {
                if (p.getCode().equals(StoredProject.CODE)) {
                    return p;
                }
            }
        }
        throw new AssertionError("no project " + StoredProject.CODE);
    }

    private static int cautions(Control c) {
        int n = c instanceof Label l && (Caution.TEXT.equals(l.getText()) || Caution.LINE.equals(l.getText())) ? 1
                : 0;
        if (c instanceof Composite parent) {
            for (Control child : parent.getChildren()) {
                n += cautions(child);
            }
        }
        return n;
    }

    @Test
    void selectingAStoredProjectListsItsQaOutcomesWithRulesAndItsResultsToSign() throws Exception {
        QaOverviewPanel qa = qaView.panel();
        ResultReviewPanel review = reviewView.panel();
        assertEquals(ResultReviewPanel.NO_PROJECT, review.heading().getText());
        review.signButton().notifyListeners(SWT.Selection, null);
        assertEquals(ResultReviewPanel.NO_PROJECT, review.heading().getText(), "signing without a project says why");

        select(project());
        Screens.waitFor(display, () -> qa.table().getItemCount() == 2, 10_000);
        TableItem cts = qa.table().getItem(0);
        assertEquals("pass", cts.getText(0));
        assertEquals("CTS pre/post agreement", cts.getText(1));
        assertEquals("3.100 %", cts.getText(2));
        assertEquals(StoredProject.CTS_RULE, cts.getText(4));
        assertEquals(StoredProject.CTS_SOURCE, cts.getText(5));
        TableItem spike = qa.table().getItem(1);
        // 0.62 lies below the 0.7 of EPA Method 320 §8.6.2
        assertEquals("FAIL", spike.getText(0));
        assertEquals(StoredProject.SPIKE_SOURCE, spike.getText(5));
        assertEquals(StoredProject.CODE + ": 2 checks: 1 passed, 1 failed", qa.summary().getText());

        assertEquals(2 * StoredProject.SAMPLES, review.table().getItemCount());
        assertTrue(review.heading().getText().startsWith("Results of " + StoredProject.CODE), review.heading()
                .getText());
        review.table().deselectAll();
        review.signButton().notifyListeners(SWT.Selection, null);
        assertEquals("Select a result in the table to review and sign it.", review.heading().getText());
        assertEquals(1, cautions(shell), "one caution per window, not one per view");
        Screens.save(shell, "stored-project-qa-and-results");
    }

    @Test
    void selectingAStoredMeasurementDrawsItsStoredSpectrumHeadedByItsResultsAndFlags() throws Exception {
        SpectrumPanel spectrum = spectrumView.panel();
        String last = stored.sampleIds.get(StoredProject.SAMPLES - 1);
        Measurement m = project().getMeasurements().stream().filter(x -> x.getId().equals(last)).findFirst()
                .orElseThrow();
        select(m);
        Screens.waitFor(display, () -> spectrum.shown() != null, 10_000);
        String title = spectrum.shown().title();
        assertTrue(title.startsWith("sample 2026-09-22 10:03:00 UTC of " + StoredProject.CODE
                + " — stored absorbance, fit not kept"), title);
        assertTrue(title.contains("CO 33.00 ± 0.50 ppm"), title);
        assertTrue(title.contains("NO 83.00 ± 0.50 ppm [HIGH_RESIDUAL]"), title);
        // the stored values' digest as the JDK computes it from the float64 little-endian bytes, first 16 digits
        ByteBuffer bytes = ByteBuffer.allocate(8 * StoredProject.band(0.4).size()).order(ByteOrder.LITTLE_ENDIAN);
        for (double v : StoredProject.band(0.4).toArray()) {
            bytes.putDouble(v);
        }
        String digest = HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(bytes.array()));
        assertTrue(title.contains("; values SHA-256 " + digest.substring(0, 16) + "…"), title);
        // the values drawn are those stored, bit for bit (float64 encoding)
        assertArrayEquals(StoredProject.band(0.4).toArray(), spectrum.shown().sample());
        assertEquals(0.4, StoredProject.band(0.4).get(286), 1e-12, "band peak at 2143 cm⁻¹");
        // the QA and review views follow the measurement's project
        Screens.waitFor(display, () -> qaView.panel().table().getItemCount() == 2, 10_000);
        assertEquals(2 * StoredProject.SAMPLES, reviewView.panel().table().getItemCount());
        Screens.save(shell, "stored-measurement-spectrum");
    }

    @Test
    void selectingAStoredLibraryListsTheReferencesItsVersionRecorded() throws Exception {
        LibraryBrowserPanel library = libraryView.panel();
        select(nav.workspace().getLibraries().get(0));
        Screens.waitFor(display, () -> library.table().getItemCount() == 2, 10_000);
        assertEquals(StoredProject.LIBRARY + ", version 1: 2 references", library.summary().getText());
        TableItem co = library.table().getItem(0);
        assertEquals("Carbon monoxide", co.getText(0));
        assertEquals("630-08-0", co.getText(1));
        assertEquals("measured (10 m cell, 2026 calibration)", co.getText(2));
        assertEquals("200", co.getText(3));
        TableItem no = library.table().getItem(1);
        assertEquals("10102-43-9", no.getText(1));
        // a computed spectrum is never shown as a measured one
        assertEquals("SYNTHETIC — computed from line parameters", no.getText(2));
        // the navigator holds the same references in the workspace model, each pinned to its spectrum file
        ReferenceLibrary model = nav.workspace().getLibraries().get(0);
        assertEquals(2, model.getReferences().size());
        ReferenceSpectrum coModel = model.getReferences().get(0);
        assertEquals(296, coModel.getTemperature());
        assertEquals(101.325, coModel.getPressure());
        assertEquals(0.5, coModel.getResolution());
        assertEquals("triangular", coModel.getApodization());
        // GNU coreutils sha256sum of co.txt's bytes, "2000 0.0\n2001 0.1\n"
        assertEquals("1144cbf01539373b27ece0d42cf8653b12f426b6489588936e973b6a0bae0d9a",
                coModel.getContentSha256());
        assertEquals(ReferenceOrigin.SYNTHETIC, model.getReferences().get(1).getOrigin());
        nav.viewer().expandToLevel(model, 1);
        Screens.flush(display);
        TreeItem libraryItem = (TreeItem) nav.viewer().testFindItem(model);
        assertEquals("Carbon monoxide  200 ppm·m", libraryItem.getItem(0).getText());
        assertEquals("Nitric oxide  100 ppm·m  (synthetic)", libraryItem.getItem(1).getText());
        Screens.save(shell, "stored-library-references");
    }

    @Test
    void doubleClickingAValueOfTheTimeSeriesOpensTheSpectrumOfItsMeasurement() throws Exception {
        // in the workbench the series view brings up the spectrum view; here the two are wired directly
        seriesView.spectrumOpener = pick -> spectrumView.open(pick.trace().measurementIds().get(pick.index()),
                seriesView.label(pick));
        select(project());
        TimeSeriesPanel series = seriesView.panel();
        Screens.waitFor(display, () -> series.heading().getText().startsWith("Stored results of"), 10_000);
        Screens.flush(display);
        ConcentrationTrace no = series.traces().stream().filter(t -> t.compound().equals("NO")).findFirst()
                .orElseThrow();
        int last = StoredProject.SAMPLES - 1;
        Event click = new Event();
        click.x = series.chart().getAxisSet().getXAxis(0).getPixelCoordinate(no.hours()[last]);
        click.y = series.chart().getAxisSet().getYAxis(0).getPixelCoordinate(no.values()[last]) + 3;
        click.button = 1;
        series.chart().getPlotArea().getControl().notifyListeners(SWT.MouseDoubleClick, click);
        SpectrumPanel spectrum = spectrumView.panel();
        Screens.waitFor(display, () -> spectrum.shown() != null, 10_000);
        String title = spectrum.shown().title();
        assertTrue(title.startsWith("NO value at 2026-09-22 10:03 UTC of " + StoredProject.CODE
                + " — stored absorbance"), title);
        assertTrue(title.contains("NO 83.00 ± 0.50 ppm [HIGH_RESIDUAL]"), title);
        assertArrayEquals(StoredProject.band(0.4).toArray(), spectrum.shown().sample());
        // far from every value nothing is picked
        assertEquals(null, series.nearest(0, 0));
        Screens.save(shell, "time-series-point-opens-spectrum");
    }

    @Test
    void theTreeGroupsMeasurementsByDayAndKindFiltersThemAndOffersActionsForWhatIsSelected() throws Exception {
        Project p = project();
        nav.viewer().expandToLevel(p, 3);
        Screens.flush(display);
        TreeItem projectItem = nav.viewer().getTree().getItem(0).getItem(0);
        TreeItem day = projectItem.getItem(0);
        assertEquals("2026-09-22", day.getText());
        // samples first, then the background taken before them
        assertEquals("sample", day.getItem(0).getText());
        assertEquals(StoredProject.SAMPLES, day.getItem(0).getItemCount());
        assertEquals("background", day.getItem(1).getText());
        // the report issued from the project follows its days
        assertEquals(2, projectItem.getItemCount());
        assertTrue(projectItem.getItem(1).getText().startsWith("report " + StoredProject.REPORT_ID + "  issued "),
                projectItem.getItem(1).getText());

        nav.filter().setText("10:02");
        Screens.flush(display);
        nav.viewer().expandToLevel(p, 3);
        Screens.flush(display);
        TreeItem filteredDay = nav.viewer().getTree().getItem(0).getItem(0).getItem(0);
        assertEquals(1, filteredDay.getItemCount(), "the background has no 10:02 measurement");
        assertEquals(1, filteredDay.getItem(0).getItemCount());
        assertEquals("sample  2026-09-22 10:02:00 UTC", filteredDay.getItem(0).getItem(0).getText());
        Screens.save(shell, "navigator-filtered");
        // the plant's or the emission source's name keeps the projects measuring it, and the site with the source
        for (String text : java.util.List.of("stack k3", "Hollin")) {
            nav.filter().setText(text);
            Screens.flush(display);
            nav.viewer().expandToLevel(nav.viewer().getTree().getItem(0).getData(), 2);
            Screens.flush(display);
            TreeItem client = nav.viewer().getTree().getItem(0);
            java.util.List<String> shown = java.util.Arrays.stream(client.getItems()).map(TreeItem::getText).toList();
            assertEquals(2, shown.size(), text + ": " + shown);
            assertTrue(shown.get(0).startsWith(StoredProject.CODE), text + ": " + shown);
            assertTrue(shown.get(1).startsWith(StoredProject.SITE), text + ": " + shown);
            nav.viewer().expandToLevel(client.getItem(1).getData(), 1);
            Screens.flush(display);
            assertEquals(1, client.getItem(1).getItemCount(), text + ": the site keeps its source");
            assertTrue(client.getItem(1).getItem(0).getText().startsWith(StoredProject.SOURCE),
                    client.getItem(1).getItem(0).getText());
        }
        Screens.save(shell, "navigator-filtered-by-source");
        nav.filter().setText("no such plant");
        Screens.flush(display);
        assertTrue(java.util.Arrays.stream(nav.viewer().getTree().getItems())
                .noneMatch(i -> i.getText().startsWith("Glasshouse")), "a text nothing carries hides the client");
        nav.filter().setText("");
        Screens.flush(display);

        java.util.List<Object> opened = new java.util.ArrayList<>();
        nav.addMenuAction(new WorkspaceNavigator.MenuAction("Open spectrum and fit", Measurement.class::isInstance,
                opened::add));
        nav.addMenuAction(new WorkspaceNavigator.MenuAction("Show results to sign", Project.class::isInstance,
                opened::add));
        assertEquals(java.util.List.of("Show results to sign"),
                nav.actionsFor(p).stream().map(WorkspaceNavigator.MenuAction::label).toList());
        Measurement first = p.getMeasurements().get(1);
        assertEquals(java.util.List.of("Open spectrum and fit"),
                nav.actionsFor(first).stream().map(WorkspaceNavigator.MenuAction::label).toList());
        nav.actionsFor(first).get(0).run().accept(first);
        assertEquals(java.util.List.of(first), opened);
        assertTrue(nav.actionsFor(nav.workspace().getLibraries().get(0)).isEmpty());
    }
}
