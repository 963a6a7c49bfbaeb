package org.tracegas.ui.views;

import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.ui.part.ViewPart;
import org.tracegas.model.AnalysisMethod;
import org.tracegas.ui.parts.MethodEditorPanel;
import org.tracegas.ui.session.Desk;

/** Edits the workspace's first method's latest version in {@link MethodEditorPanel}. */
public final class MethodEditorView extends ViewPart {

    public static final String ID = "org.tracegas.ui.views.methodEditor";

    private MethodEditorPanel panel;

    @Override
    public void createPartControl(Composite parent) {
        Desk desk = Desk.get();
        panel = new MethodEditorPanel(parent, SWT.NONE, desk.editor());
        if (desk.project() != null && !desk.project().model().getMethods().isEmpty()) {
            AnalysisMethod m = desk.project().model().getMethods().get(0);
            panel.open(m, m.getVersions().get(m.getVersions().size() - 1), desk.project().method());
            panel.saveTo(desk.access().store(), desk.session());
        }
    }

    @Override
    public void setFocus() {
        panel.setFocus();
    }
}
