package org.tracegas.ui.flows;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;

import org.eclipse.jface.viewers.StructuredSelection;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Event;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.ui.IWorkbenchPage;
import org.eclipse.ui.IWorkbenchWindow;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.method.StoredMethod;
import org.tracegas.model.AnalysisMethod;
import org.tracegas.model.ContentVersion;
import org.tracegas.model.VersionKind;
import org.tracegas.store.WorkspaceStore;
import org.tracegas.ui.Screens;
import org.tracegas.ui.parts.MethodEditorPanel;
import org.tracegas.ui.parts.WorkspaceNavigator;
import org.tracegas.ui.session.Desk;
import org.tracegas.ui.views.MethodEditorView;
import org.tracegas.ui.views.NavigatorView;

/**
 * The analyst revises the lab's method in the started product ({@link StartedWorkbench}): she chooses the method in
 * the workspace tree, the Method view opens its stored version, she narrows the CO window, is refused without a
 * reason, gives one and saves; the workspace then holds version 2, derived from version 1, by her, with her reason
 * and the narrowed window in its method text, and the tree lists the method with it.
 */
class DeskWorkbenchMethodVersionTest {

    @TempDir
    Path folder;

    @Test
    void theAnalystEditsTheMethodInTheMethodViewAndSavesItAsANewVersion() throws Exception {
        try (LabDesk lab = new LabDesk(folder, 800, 600)) {
            assertNotNull(lab.lab);
        }
        StartedWorkbench.run(folder.resolve("ws"), LimeKilnLab.ANALYST, LimeKilnLab.PASSWORD,
                DeskWorkbenchMethodVersionTest::drive);
    }

    private static void drive(Display display, IWorkbenchWindow window) throws Exception {
        Shell shell = window.getShell();
        IWorkbenchPage page = window.getActivePage();
        WorkspaceNavigator nav = StartedWorkbench.find(shell, WorkspaceNavigator.class);
        Screens.waitFor(display, () -> nav.workspace() != null && !nav.workspace().getMethods().isEmpty(), 30_000);
        AnalysisMethod method = nav.workspace().getMethods().get(0);
        assertEquals(LimeKilnLab.METHOD, method.getName());
        page.showView(MethodEditorView.ID);
        MethodEditorPanel editor = StartedWorkbench.find(shell, MethodEditorPanel.class);
        assertNotNull(editor, "the desk shows the Method view");

        // choosing the method in the tree opens its latest stored version in the Method view
        page.activate(page.findView(NavigatorView.ID));
        nav.viewer().setSelection(new StructuredSelection(method), true);
        Screens.waitFor(display, () -> LimeKilnLab.METHOD.equals(editor.nameField().getText()), 30_000);
        WorkspaceStore store = Desk.get().access().store();
        ContentVersion first = store.versions().latest(VersionKind.METHOD, LimeKilnLab.METHOD).orElseThrow();
        assertEquals(1, first.getNumber());
        double lower = Double.parseDouble(editor.lowerField().getText());
        double narrowed = lower + 10;
        assertFalse(editor.saveButton().isEnabled(), "nothing to save before an edit");

        edit(editor, narrowed);
        Screens.flush(display);
        assertTrue(editor.saveButton().isEnabled(), "an edit can be saved");
        press(editor.saveButton());
        assertEquals("reason: a new method version needs a reason", editor.problems().getText());
        assertEquals(1, store.versions().latest(VersionKind.METHOD, LimeKilnLab.METHOD).orElseThrow().getNumber(),
                "nothing stored without a reason");

        editor.reasonField().setText("CO window starts above the far wing of the water line below it");
        press(editor.saveButton());
        assertEquals("Saved as version 2.", editor.problems().getText());
        ContentVersion saved = store.versions().latest(VersionKind.METHOD, LimeKilnLab.METHOD).orElseThrow();
        assertEquals(2, saved.getNumber());
        assertEquals(first.getId(), saved.getParentId(), "derived from the version opened");
        assertEquals(Desk.get().session().userId(), saved.getAuthorId(), "by the analyst logged in");
        assertEquals("CO window starts above the far wing of the water line below it", saved.getReason());
        StoredMethod back = StoredMethod.parse(store.versions().content(saved.getId()), "saved");
        assertEquals(narrowed, back.method().analytes().get(0).regions().get(0).low());
        assertEquals(StoredMethod.parse(store.versions().content(first.getId()), "first").libraryVersionId(),
                back.libraryVersionId(), "the same library version pinned");

        // the tree follows the store: the method is listed with its latest version, the one saved
        Screens.waitFor(display, () -> nav.workspace().getMethods().stream()
                .filter(m -> m.getName().equals(LimeKilnLab.METHOD))
                .anyMatch(m -> m.getVersions().size() == 1 && m.getVersions().get(0).getNumber() == 2), 30_000);
        nav.viewer().expandAll();
        Screens.flush(display);
        Screens.save(shell, "workbench-method-saved-as-version-2");
        StartedWorkbench.assertInside(editor);
    }

    /** Types the new lower limit of the CO window; the field applies each change as a command. */
    private static void edit(MethodEditorPanel editor, double lower) {
        editor.lowerField().setText(Double.toString(lower));
    }

    private static void press(org.eclipse.swt.widgets.Widget w) {
        w.notifyListeners(SWT.Selection, new Event());
    }
}
