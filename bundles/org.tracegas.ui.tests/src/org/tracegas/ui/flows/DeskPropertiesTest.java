package org.tracegas.ui.flows;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.util.HexFormat;
import java.util.LinkedHashMap;
import java.util.Map;

import org.eclipse.jface.viewers.AbstractTreeViewer;
import org.eclipse.jface.viewers.StructuredSelection;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Tree;
import org.eclipse.swt.widgets.TreeItem;
import org.eclipse.ui.IPageLayout;
import org.eclipse.ui.IViewPart;
import org.eclipse.ui.IWorkbenchPage;
import org.eclipse.ui.IWorkbenchWindow;
import org.eclipse.ui.views.properties.IPropertySheetEntry;
import org.eclipse.ui.views.properties.PropertySheet;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.model.Measurement;
import org.tracegas.model.Project;
import org.tracegas.ui.Screens;
import org.tracegas.ui.parts.WorkspaceNavigator;
import org.tracegas.ui.views.NavigatorView;

/**
 * The workspace tree and the properties view of the product's workbench ({@link StartedWorkbench}) on a real
 * H2 workspace into which the desk imported the lime works' morning: the tree shows the store's objects through
 * the workspace model's item providers, with their labels and icons, and the properties view shows the selected
 * measurement's features, read only, as the store read them from the imported file.
 */
class DeskPropertiesTest {

    @TempDir
    Path folder;

    @Test
    void theTreeAndThePropertiesViewShowTheStoredObjectsThroughTheItemProviders() throws Exception {
        Path first;
        try (LabDesk lab = new LabDesk(folder, 800, 600)) {
            lab.importedMorning();
            first = folder.resolve("day").resolve("s01.jdx");
        }
        // the raw file's hash by the JDK's own SHA-256 (FIPS 180-4), not the store's
        String sha256 = HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(Files.readAllBytes(
                first)));
        Path[] shot = new Path[1];
        StartedWorkbench.run(folder.resolve("ws"), LimeKilnLab.ANALYST, LimeKilnLab.PASSWORD,
                (display, window) -> shot[0] = drive(display, window, sha256));
        assertNotNull(shot[0]);
    }

    private static Path drive(Display display, IWorkbenchWindow window, String sha256) throws Exception {
        IWorkbenchPage page = window.getActivePage();
        // on the analysis desk the properties view is open beneath the tree
        PropertySheet properties = (PropertySheet) page.findView(IPageLayout.ID_PROP_SHEET);
        assertNotNull(properties, "the desk layout opens the properties view");
        IViewPart navigatorView = page.findView(NavigatorView.ID);
        WorkspaceNavigator nav = StartedWorkbench.find(window.getShell(), WorkspaceNavigator.class);
        Screens.waitFor(display, () -> LabDesk.project(nav) != null, 30_000);
        Project project = LabDesk.project(nav);
        nav.viewer().expandToLevel(AbstractTreeViewer.ALL_LEVELS);
        Screens.flush(display);

        TreeItem client = nav.viewer().getTree().getItem(0);
        assertEquals("Quarrymoor Lime Works", client.getText());
        assertNotNull(client.getImage(), "the item providers' client icon");
        TreeItem projectItem = client.getItem(0);
        assertEquals("QLW-2026-12  Kiln 2 stack, December  (4 measurements)", projectItem.getText());
        TreeItem day = projectItem.getItem(0);
        assertEquals("2026-12-03", day.getText());
        assertNull(day.getImage(), "a day is the tree's own grouping, no model object");
        TreeItem samples = day.getItem(0);
        assertEquals("sample", samples.getText());
        // s01.jdx states 07:00 as its ##LONGDATE; s04.jdx, without, takes 07:03 given at import
        assertEquals("sample  2026-12-03 07:00:00 UTC", samples.getItem(0).getText());
        assertEquals("sample  2026-12-03 07:03:00 UTC", samples.getItem(3).getText());
        TreeItem methods = nav.viewer().getTree().getItem(2);
        assertEquals("Analysis methods", methods.getText());
        assertEquals(LimeKilnLab.METHOD, methods.getItem(0).getText());
        TreeItem version = methods.getItem(0).getItem(0);
        assertTrue(version.getText().startsWith("version 1"), version.getText());
        // the method file's region = 2060..2240 (LimeKilnLab), a child of the version through its item provider
        assertEquals("CO  2060–2240 cm-1", version.getItem(0).getText());

        Measurement s01 = (Measurement) samples.getItem(0).getData();
        assertEquals(project, s01.getProject());
        page.activate(navigatorView);
        nav.viewer().setSelection(new StructuredSelection(s01), true);
        Tree sheet = (Tree) properties.getCurrentPage().getControl();
        Screens.waitFor(display, () -> sheet.getItemCount() > 5, 10_000);
        Map<String, String> shown = new LinkedHashMap<>();
        for (TreeItem row : sheet.getItems()) {
            shown.put(row.getText(0), row.getText(1));
            // a stored record is audited: the sheet offers no cell editor for any of its features
            assertNull(((IPropertySheetEntry) row.getData()).getEditor(sheet), row.getText(0) + " is read only");
        }
        assertEquals("sample", shown.get("Kind"));
        assertEquals("2026-12-03T07:00:00Z", shown.get("Time (UTC)"));
        // the file's ##CELL TEMPERATURE and ##CELL PRESSURE labels as LimeKilnLab wrote them
        assertEquals(Double.toString(LimeKilnLab.T_CELL), shown.get("Cell temperature (K)"));
        assertEquals(Double.toString(LimeKilnLab.P_CELL), shown.get("Cell pressure (hPa)"));
        assertEquals("absorbance", shown.get("Content"));
        assertEquals("s01.jdx", shown.get("Source file"));
        assertEquals(sha256, shown.get("Source file SHA-256"));
        assertEquals("0", shown.get("Record in source file (from 0)"));
        assertNull(shown.get("Spectrum"), "the values are a stored block, no property: " + shown.keySet());
        return Screens.save(window.getShell(), "workbench-properties-of-a-measurement");
    }
}
