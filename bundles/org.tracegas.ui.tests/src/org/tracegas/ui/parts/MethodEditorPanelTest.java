package org.tracegas.ui.parts;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

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
import org.tracegas.model.AnalysisMethod;
import org.tracegas.model.AnalysisRegion;
import org.tracegas.model.MethodVersion;
import org.tracegas.model.Workspace;
import org.tracegas.model.WorkspaceFactory;
import org.tracegas.model.edit.ModelEditor;
import org.tracegas.ui.Screens;

class MethodEditorPanelTest {

    private Display display;
    private Shell shell;
    private ModelEditor editor;
    private AnalysisMethod method;
    private AnalysisRegion region;
    private MethodEditorPanel panel;

    @BeforeEach
    void open() {
        display = Display.getDefault();
        shell = new Shell(display);
        shell.setLayout(new FillLayout());
        shell.setSize(800, 640);
        editor = new ModelEditor();
        WorkspaceFactory f = WorkspaceFactory.eINSTANCE;
        Workspace w = f.createWorkspace();
        method = f.createAnalysisMethod();
        method.setName("Stack CO");
        MethodVersion v = f.createMethodVersion();
        v.setNumber(2);
        region = f.createAnalysisRegion();
        region.setCompound("CO");
        region.setLowerWavenumber(2085);
        region.setUpperWavenumber(2190);
        v.getRegions().add(region);
        method.getVersions().add(v);
        w.getMethods().add(method);
        editor.createResource("test:/w").getContents().add(w);
        panel = new MethodEditorPanel(shell, SWT.NONE, editor);
        panel.open(method, v);
        shell.open();
        Screens.flush(display);
    }

    @AfterEach
    void close() {
        shell.dispose();
    }

    private static void press(org.eclipse.swt.widgets.Button b) {
        b.notifyListeners(SWT.Selection, new Event());
    }

    @Test
    void aValidEditGoesIntoTheModelAndUndoRedoWalkThroughIt() {
        assertFalse(panel.undoButton().isEnabled());
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
        assertEquals("Stack CO", method.getName());
        panel.nameField().setText("Stack CO, wider");
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
            if (i.getText(0).equals("region.1.upper_cm-1")) {
                assertEquals("2190.00", i.getText(1));
                assertEquals("2195.00", i.getText(2));
                changed = i.getBackground();
            }
        }
        assertEquals(Palette.CHANGED, changed);
        assertEquals("Version 2 as opened", c.table().getColumn(1).getText());
    }
}
