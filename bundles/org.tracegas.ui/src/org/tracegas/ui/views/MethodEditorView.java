package org.tracegas.ui.views;

import org.eclipse.jface.viewers.ISelection;
import org.eclipse.jface.viewers.IStructuredSelection;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.ui.ISelectionListener;
import org.eclipse.ui.IWorkbenchPart;
import org.eclipse.ui.part.ViewPart;
import org.tracegas.model.AnalysisMethod;
import org.tracegas.model.MethodVersion;
import org.tracegas.ui.parts.MethodEditorPanel;
import org.tracegas.ui.session.Desk;

/**
 * Edits a method version in {@link MethodEditorPanel}: at first the demo's method, then the method or method
 * version selected in the navigator, read afresh from the store.
 */
public final class MethodEditorView extends ViewPart {

    public static final String ID = "org.tracegas.ui.views.methodEditor";

    private MethodEditorPanel panel;
    private final ISelectionListener methodListener = this::selected;

    @Override
    public void createPartControl(Composite parent) {
        Desk desk = Desk.get();
        panel = new MethodEditorPanel(parent, SWT.NONE, desk.editor());
        panel.saveTo(desk.access().store(), desk.session());
        panel.whenSaved(desk::storeChanged);
        getSite().getPage().addSelectionListener(NavigatorView.ID, methodListener);
    }

    private void selected(IWorkbenchPart part, ISelection selection) {
        if (panel.isDisposed() || !(selection instanceof IStructuredSelection s)) {
            return;
        }
        Object o = s.getFirstElement();
        if (o instanceof AnalysisMethod m && !m.getVersions().isEmpty()) {
            o = m.getVersions().get(m.getVersions().size() - 1);
        }
        if (o instanceof MethodVersion v && v.getId() != null) {
            panel.openStored(v.getId());
        }
    }

    @Override
    public void dispose() {
        getSite().getPage().removeSelectionListener(NavigatorView.ID, methodListener);
        super.dispose();
    }

    @Override
    public void setFocus() {
        panel.setFocus();
    }
}
