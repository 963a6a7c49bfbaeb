package org.tracegas.ui.parts;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;

import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.Color;
import org.eclipse.swt.layout.FillLayout;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Event;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.swt.widgets.TableItem;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.method.StoredMethod;
import org.tracegas.model.AnalysisMethod;
import org.tracegas.model.AnalysisRegion;
import org.tracegas.model.ContentVersion;
import org.tracegas.model.MethodVersion;
import org.tracegas.model.VersionKind;
import org.tracegas.model.edit.ModelEditor;
import org.tracegas.quantify.Analyte;
import org.tracegas.store.Session;
import org.tracegas.ui.Screens;
import org.tracegas.ui.session.DemoStaff;
import org.tracegas.ui.session.SeededProject;
import org.tracegas.ui.session.WorkspaceAccess;

/**
 * The method editor on the demo method of a real embedded workspace: edits through the command stack, checks
 * of each field, the comparison in the method file's text, and saving a new version into the store.
 */
class MethodEditorPanelTest {

    @TempDir
    Path folder;

    private WorkspaceAccess access;
    private Session analyst;
    private SeededProject.Seeded demo;
    private Display display;
    private Shell shell;
    private AnalysisMethod method;
    private AnalysisRegion region;
    private MethodEditorPanel panel;

    @BeforeEach
    void open() {
        access = WorkspaceAccess.openH2(folder);
        demo = DemoStaff.seed(access.store());
        analyst = access.store().users().logIn(DemoStaff.ANALYST, DemoStaff.PASSWORD.toCharArray());
        display = Display.getDefault();
        shell = new Shell(display);
        shell.setLayout(new FillLayout());
        shell.setSize(900, 640);
        ModelEditor editor = new ModelEditor();
        editor.createResource("test:/w").getContents().add(demo.model());
        method = demo.model().getMethods().get(0);
        MethodVersion v = method.getVersions().get(0);
        region = v.getRegions().get(0);
        panel = new MethodEditorPanel(shell, SWT.NONE, editor);
        panel.open(method, v, demo.method());
        panel.saveTo(access.store(), analyst);
        shell.open();
        Screens.flush(display);
    }

    @AfterEach
    void close() {
        shell.dispose();
        access.close();
    }

    private static void press(org.eclipse.swt.widgets.Button b) {
        b.notifyListeners(SWT.Selection, new Event());
    }

    @Test
    void aValidEditGoesIntoTheModelAndUndoRedoWalkThroughIt() {
        assertFalse(panel.undoButton().isEnabled());
        assertFalse(panel.saveButton().isEnabled(), "nothing to save before an edit");
        panel.lowerField().setText("2070");
        assertEquals(2070, region.getLowerWavenumber());
        assertTrue(panel.undoButton().isEnabled());
        press(panel.undoButton());
        assertEquals(2085, region.getLowerWavenumber());
        assertEquals("2085.00", panel.lowerField().getText());
        assertTrue(panel.redoButton().isEnabled());
        press(panel.redoButton());
        assertEquals(2070, region.getLowerWavenumber());
        assertEquals("2070.00", panel.lowerField().getText());
    }

    @Test
    void wrongFieldsAreMarkedAndNamedAndLeaveTheModelAlone() throws Exception {
        panel.lowerField().setText("20x0");
        assertEquals("Lower wavenumber: '20x0' is not a number", panel.problems().getText());
        assertTrue(panel.decorated(panel.lowerField()));
        assertEquals(2085, region.getLowerWavenumber());
        panel.lowerField().setText("2200");
        assertEquals("Upper wavenumber: must lie above the lower wavenumber 2200 cm⁻¹", panel.problems().getText());
        assertEquals(2085, region.getLowerWavenumber());
        panel.nameField().setText(" ");
        assertEquals("Method name: must not be empty", panel.problems().getText());
        assertEquals("Kiln stack CO and N2O", method.getName());
        panel.lowerField().setText("2080");
        assertEquals("", panel.problems().getText());
        assertFalse(panel.decorated(panel.lowerField()));
        Screens.save(shell, "method-editor");
    }

    @Test
    void theComparisonHighlightsFieldsThatDifferFromTheVersionAsOpened() {
        panel.upperField().setText("2195");
        VersionComparisonPanel c = panel.comparison();
        assertEquals("1 field differs (highlighted).", c.summary().getText());
        Color changed = null;
        for (TableItem i : c.table().getItems()) {
            if (i.getText(0).equals("analyte.1.region.1")) {
                assertEquals("2085.0..2190.0 baseline 1", i.getText(1));
                assertEquals("2085.0..2195.0 baseline 1", i.getText(2));
                changed = i.getBackground();
            }
        }
        assertEquals(Palette.CHANGED, changed);
        assertEquals("Version 1 as opened", c.table().getColumn(1).getText());
    }

    @Test
    void saveRecordsTheDraftAsANewVersionRevisedFromTheOpenedOne() throws Exception {
        panel.lowerField().setText("2070");
        press(panel.saveButton());
        assertEquals("reason: a new method version needs a reason", panel.problems().getText());
        assertEquals(1, access.store().versions().latest(VersionKind.METHOD, method.getName()).orElseThrow()
                .getNumber(), "nothing stored without a reason");

        panel.reasonField().setText("CO window widened below the water lines");
        press(panel.saveButton());
        assertEquals("Saved as version 2.", panel.problems().getText());
        ContentVersion saved = access.store().versions().latest(VersionKind.METHOD, method.getName()).orElseThrow();
        assertEquals(2, saved.getNumber());
        assertEquals(demo.methodVersionId(), saved.getParentId());
        assertEquals(analyst.userId(), saved.getAuthorId());
        assertEquals("CO window widened below the water lines", saved.getReason());
        StoredMethod back = StoredMethod.parse(access.store().versions().content(saved.getId()), "saved");
        Analyte co = back.method().analytes().get(0);
        assertEquals(2070, co.regions().get(0).low());
        assertEquals(2190, co.regions().get(0).high());
        assertEquals(demo.method().method().references(), back.method().references());
        assertEquals(demo.method().libraryVersionId(), back.libraryVersionId());
        // the version as opened stays as stored; the editor now holds the new one
        assertEquals(2085, method.getVersions().get(0).getRegions().get(0).getLowerWavenumber());
        assertEquals(2, method.getVersions().size());
        assertEquals(2070, method.getVersions().get(1).getRegions().get(0).getLowerWavenumber());
        assertEquals("Version 2 as opened", panel.comparison().table().getColumn(1).getText());
        assertFalse(panel.undoButton().isEnabled());

        // the first version, opened again from the store, is as it was stored
        panel.openStored(demo.methodVersionId());
        assertEquals("Version 1 as opened", panel.comparison().table().getColumn(1).getText());
        assertEquals("2085.00", panel.lowerField().getText());
        assertEquals("The versions hold the same values.", panel.comparison().summary().getText());
    }

    @Test
    void theAnalytesInterferentsAreEditedAsOneCommandCheckedAndSaved() throws Exception {
        // the demo's CO analyte is fitted with water (SeededProject); N2O's band borders the CO window
        assertEquals("H2O", panel.interferentsField().getText());
        panel.interferentsField().setText("H2O, SO2");
        assertEquals("Interferents: the method has no reference of 'SO2' (it has CO, H2O, N2O)",
                panel.problems().getText());
        assertTrue(panel.decorated(panel.interferentsField()));
        assertEquals(List.of("H2O"), region.getInterferents());
        panel.interferentsField().setText("H2O, CO");
        assertEquals("Interferents: CO is the analyte itself", panel.problems().getText());
        panel.interferentsField().setText("H2O, N2O");
        assertEquals("", panel.problems().getText());
        assertEquals(List.of("H2O", "N2O"), region.getInterferents());
        assertEquals("1 field differs (highlighted).", panel.comparison().summary().getText());
        press(panel.undoButton());
        assertEquals(List.of("H2O"), region.getInterferents());
        assertEquals("H2O", panel.interferentsField().getText());
        press(panel.redoButton());
        assertEquals("H2O, N2O", panel.interferentsField().getText());

        StoredMethod back = savedAsVersion2("N2O's band edge overlaps the CO window");
        assertEquals(List.of("H2O", "N2O"), back.method().analytes().get(0).interferents());
        assertEquals(List.of("CO"), back.method().analytes().get(1).interferents());
    }

    @Test
    void anyTwoVersionsOfTheMethodAreComparedInTheWholeMethodText() throws Exception {
        panel.upperField().setText("2195");
        panel.reasonField().setText("CO window reaches the N2O band's edge");
        press(panel.saveButton());
        panel.interferentsField().setText("H2O, N2O");
        VersionComparisonPanel c = panel.comparison();
        assertEquals(List.of("Draft", "Version 2 as opened", "Version 1"), List.of(c.chooserA().getItems()));
        assertEquals("Version 2 as opened", c.chooserA().getText());
        assertEquals("Draft", c.chooserB().getText());
        assertEquals("1 field differs (highlighted).", c.summary().getText());

        // the first version beside the draft: the span saved in version 2 and the draft's interferents differ,
        // and every other field of the whole method text (settings, transform, references) is the same
        c.chooserA().select(2);
        c.chooserA().notifyListeners(SWT.Selection, new Event());
        assertEquals("2 fields differ (highlighted).", c.summary().getText());
        assertEquals("Version 1", c.table().getColumn(1).getText());
        List<String> differing = new java.util.ArrayList<>();
        for (TableItem i : c.table().getItems()) {
            if (Palette.CHANGED.equals(i.getBackground())) {
                differing.add(i.getText(0) + ": " + i.getText(1) + " | " + i.getText(2));
            }
        }
        assertEquals(List.of("analyte.1.interferents: H2O | H2O, N2O",
                "analyte.1.region.1: 2085.0..2190.0 baseline 1 | 2085.0..2195.0 baseline 1"), differing);
        assertTrue(c.table().getItemCount() > 10, "the whole method: " + c.table().getItemCount() + " fields");
        Screens.save(shell, "method-versions-compared");
        // the choice stays while the draft is edited on
        panel.lowerField().setText("2080");
        assertEquals("Version 1", c.chooserA().getText());
        assertEquals("2 fields differ (highlighted).", c.summary().getText());
        assertTrue(List.of(c.table().getItems()).stream().anyMatch(i -> i.getText(0).equals("analyte.1.region.1")
                && i.getText(2).equals("2080.0..2195.0 baseline 1")));
    }

    /**
     * Saves the draft with a reason and reads the new version's stored method back, revised by the analyst from
     * the version opened.
     */
    private StoredMethod savedAsVersion2(String reason) throws Exception {
        panel.reasonField().setText(reason);
        press(panel.saveButton());
        assertEquals("Saved as version 2.", panel.problems().getText());
        ContentVersion saved = access.store().versions().latest(VersionKind.METHOD, method.getName()).orElseThrow();
        assertEquals(demo.methodVersionId(), saved.getParentId());
        assertEquals(analyst.userId(), saved.getAuthorId());
        return StoredMethod.parse(access.store().versions().content(saved.getId()), "saved");
    }

    private void choose(int index) {
        panel.regionChooser().select(index);
        panel.regionChooser().notifyListeners(SWT.Selection, new Event());
    }

    @Test
    void regionsAreAddedAndRemovedAsCommandsAndUndoRestoresThem() throws Exception {
        MethodVersion v = method.getVersions().get(0);
        assertEquals(2, panel.regionChooser().getItemCount());
        press(panel.addRegionButton());
        // a region of the selected analyte beside it, selected for editing
        assertEquals(3, v.getRegions().size());
        assertEquals(1, panel.regionChooser().getSelectionIndex());
        AnalysisRegion added = v.getRegions().get(1);
        assertEquals("CO", added.getCompound());
        assertEquals(List.of("H2O"), added.getInterferents());
        assertEquals(0, added.getOpenedAs(), "a region the stored method does not have");
        // the same width as the selected 2085–2190 cm⁻¹, 1 cm⁻¹ above it
        assertEquals("2191.00", panel.lowerField().getText());
        assertEquals("2296.00", panel.upperField().getText());
        panel.baselineField().setText("4");
        assertEquals("Baseline order: must be 0 to 3, was 4", panel.problems().getText());
        assertTrue(panel.decorated(panel.baselineField()));
        assertEquals(1, added.getBaselineOrder());
        panel.baselineField().setText("0");
        assertEquals(0, added.getBaselineOrder());
        assertTrue(List.of(panel.comparison().table().getItems()).stream().anyMatch(i -> i.getText(0).equals(
                "analyte.1.region.2") && i.getText(2).equals("2191.0..2296.0 baseline 0")));
        press(panel.undoButton());
        assertEquals(1, added.getBaselineOrder());
        press(panel.undoButton());
        assertEquals(2, v.getRegions().size());
        assertEquals(2, panel.regionChooser().getItemCount());
        assertEquals("The versions hold the same values.", panel.comparison().summary().getText());

        choose(1);
        assertEquals("N2O", panel.compoundField().getText());
        AnalysisRegion n2o = v.getRegions().get(1);
        press(panel.removeRegionButton());
        assertEquals(List.of(region), v.getRegions());
        assertEquals("CO", panel.compoundField().getText());
        assertFalse(panel.removeRegionButton().isEnabled(), "a method keeps one region");
        press(panel.undoButton());
        assertEquals(List.of(region, n2o), v.getRegions());
        assertEquals(2, n2o.getOpenedAs());
        press(panel.redoButton());

        StoredMethod back = savedAsVersion2("N2O reported from the second cell only");
        assertEquals(List.of("CO"), back.method().analytes().stream().map(Analyte::compound).toList());
        assertEquals(demo.method().method().analytes().get(0), back.method().analytes().get(0));
        assertEquals(demo.method().method().references(), back.method().references());
    }

    @Test
    void thePathLengthAndIterationLimitAreEditedCheckedAndSaved() throws Exception {
        MethodVersion v = method.getVersions().get(0);
        assertEquals("5.0", panel.pathLengthField().getText());
        panel.pathLengthField().setText("0");
        assertEquals("Path length: must be a positive number of metres, was 0", panel.problems().getText());
        assertTrue(panel.decorated(panel.pathLengthField()));
        assertEquals(5.0, v.getPathLength());
        panel.pathLengthField().setText("9.75");
        assertEquals(9.75, v.getPathLength());
        panel.maxIterationsField().setText("8O");
        assertEquals("Max. fit iterations: '8O' is not a whole number", panel.problems().getText());
        panel.maxIterationsField().setText("80");
        assertEquals(80, v.getMaxIterations());
        assertEquals("2 fields differ (highlighted).", panel.comparison().summary().getText());
        press(panel.undoButton());
        assertEquals(demo.method().method().maxIterations(), v.getMaxIterations());
        press(panel.redoButton());
        Screens.save(shell, "method-editor-settings");

        StoredMethod back = savedAsVersion2("Cell refitted with the longer mirror set");
        assertEquals(9.75, back.method().pathLengthMetres());
        assertEquals(80, back.method().maxIterations());
        assertEquals(demo.method().method().analytes(), back.method().analytes());
    }

    private static void choose(org.eclipse.swt.widgets.Combo c, String item) {
        c.select(c.indexOf(item));
        c.notifyListeners(SWT.Selection, new Event());
    }

    @Test
    void theFitAlgorithmAndPathSourceAreChosenAsCommandsAndSaved() throws Exception {
        MethodVersion v = method.getVersions().get(0);
        // the method texts' names (MethodDefinition): the default algorithm and the nominal path
        assertEquals("classical-least-squares", panel.algorithmChooser().getText());
        assertEquals("nominal", panel.pathSourceChooser().getText());
        assertEquals(List.of("nominal", "cts-derived"), List.of(panel.pathSourceChooser().getItems()));
        assertTrue(List.of(panel.algorithmChooser().getItems()).contains("curve-of-growth"));
        assertFalse(List.of(panel.algorithmChooser().getItems()).contains("line-list"),
                "line-list needs the method file's [line-list] block");
        choose(panel.algorithmChooser(), "curve-of-growth");
        choose(panel.pathSourceChooser(), "cts-derived");
        assertEquals("curve-of-growth", v.getAlgorithm());
        assertEquals("cts-derived", v.getPathSource());
        assertEquals("2 fields differ (highlighted).", panel.comparison().summary().getText());
        press(panel.undoButton());
        assertEquals("nominal", v.getPathSource());
        assertEquals("nominal", panel.pathSourceChooser().getText());
        press(panel.redoButton());

        StoredMethod back = savedAsVersion2("Curve of growth for the strong CO lines; path from the CTS readings");
        assertEquals("curve-of-growth", back.method().algorithm().name());
        assertTrue(back.declaration().contains("\npath-source = cts-derived\n"), back.declaration());
        assertEquals(demo.method().method().analytes(), back.method().analytes());
    }

    @Test
    void theHeadsSettingsAndTheRecipeAreEditedCheckedUndoneAndSaved() throws Exception {
        MethodVersion v = method.getVersions().get(0);
        // the method text's words and defaults (MethodDefinition)
        assertEquals(List.of("ppm", "ppb", "percent"), List.of(panel.reportingUnitChooser().getItems()));
        assertEquals("ppm", panel.reportingUnitChooser().getText());
        assertEquals(List.of("none", "shift", "shift-and-width", "scale"), List.of(panel.shiftChooser().getItems()));
        assertEquals("", panel.recipeField().getText(), "the demo method has no processing steps");
        assertFalse(panel.cellConditionsChooser().isEnabled(), "classical least squares computes no spectra");

        panel.toleranceField().setText("1");
        assertEquals("Tolerance: must be between 0 and 1 (a relative change), was 1", panel.problems().getText());
        assertTrue(panel.decorated(panel.toleranceField()));
        assertEquals(demo.method().method().tolerance(), v.getTolerance());
        panel.toleranceField().setText("1e-5");
        assertEquals(1e-5, v.getTolerance());
        panel.maxAbsorbanceField().setText("-0.5");
        assertEquals("Max. absorbance: must be a positive number, was -0.5", panel.problems().getText());
        panel.maxAbsorbanceField().setText("0.9");
        assertEquals(0.9, v.getMaxAbsorbance());
        panel.nonlinearityCheck().setSelection(!v.isNonlinearity());
        press(panel.nonlinearityCheck());
        assertEquals(panel.nonlinearityCheck().getSelection(), v.isNonlinearity());
        choose(panel.reportingUnitChooser(), "ppb");
        assertEquals("ppb", v.getReportingUnit());
        choose(panel.shiftChooser(), "shift");
        assertEquals("shift", v.getShiftTerm());

        // steps the desk's registry does not make are named by their place and left out of the model
        panel.recipeField().setText("baseline degree=0;regions=2000:2010\nsmooth width=3");
        assertTrue(panel.problems().getText().startsWith("Recipe step 2: "), panel.problems().getText());
        assertTrue(panel.decorated(panel.recipeField()));
        assertEquals(List.of(), v.getRecipeSteps());
        panel.recipeField().setText("baseline degree=0;regions=2000:2010\nshift offset=");
        assertTrue(panel.problems().getText().startsWith("Recipe step 2: "), panel.problems().getText());
        panel.recipeField().setText("baseline degree=0;regions=2000:2010\n\nshift offset=0.1\n");
        assertEquals("", panel.problems().getText());
        assertEquals(List.of("baseline degree=0;regions=2000:2010", "shift offset=0.1"), v.getRecipeSteps());
        press(panel.undoButton());
        assertEquals(List.of(), v.getRecipeSteps(), "one command for the whole recipe");
        assertEquals("", panel.recipeField().getText());
        press(panel.redoButton());
        assertEquals("baseline degree=0;regions=2000:2010\nshift offset=0.1", panel.recipeField().getText());
        // tolerance, max-absorbance, nonlinearity, reporting-unit, shift and the two steps, each a field
        assertEquals("7 fields differ (highlighted).", panel.comparison().summary().getText());
        ((org.eclipse.swt.custom.ScrolledComposite) panel.recipeField().getParent().getParent()).showControl(
                panel.recipeField());
        Screens.save(shell, "method-editor-head-and-recipe");

        StoredMethod back = savedAsVersion2("Results in ppb for the low CO campaign; zero-offset and 0.1 cm⁻¹ shift"
                + " before the fit");
        assertEquals(org.tracegas.quantify.ReportingUnit.PPB, back.method().reportingUnit());
        assertEquals(org.tracegas.quantify.ShiftTerm.SHIFT, back.method().shiftTerm());
        assertEquals(1e-5, back.method().tolerance());
        assertEquals(0.9, back.method().maxAbsorbance());
        assertEquals(!demo.method().method().nonlinearity(), back.method().nonlinearity());
        assertEquals(List.of("baseline", "shift"), back.recipe().entries().stream().map(e -> e.stepId()).toList());
        assertEquals(demo.method().method().analytes(), back.method().analytes());
        // the new version opened in the editor shows what it holds
        assertEquals("ppb", panel.reportingUnitChooser().getText());
        assertEquals("baseline degree=0;regions=2000:2010\nshift offset=0.1", panel.recipeField().getText());
    }

    @Test
    void aVersionWithoutAMethodTextIsNamedAndNotOpened() {
        ContentVersion other = access.store().versions().create(analyst, VersionKind.METHOD, "Not a method",
                "compounds=CO\n", "an old note");
        panel.openStored(other.getId());
        assertTrue(panel.problems().getText().startsWith("The method version cannot be opened: "),
                panel.problems().getText());
        assertTrue(panel.problems().getText().contains(other.getId()), panel.problems().getText());
        assertEquals("Version 1 as opened", panel.comparison().table().getColumn(1).getText());
        assertEquals("Kiln stack CO and N2O", panel.nameField().getText());
    }
}
