package org.tracegas.ui.views;

import java.util.List;
import java.util.function.Consumer;

import org.eclipse.jface.viewers.IStructuredSelection;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Display;
import org.eclipse.ui.part.ViewPart;
import org.tracegas.model.Project;
import org.tracegas.model.Workspace;
import org.tracegas.ui.jobs.AnalysisRuns;
import org.tracegas.ui.jobs.BatchQuantificationJob;
import org.tracegas.ui.parts.WorkspaceNavigator;
import org.tracegas.ui.session.Desk;
import org.tracegas.ui.session.StoredWorkspace;

/** The workspace tree; double-clicking a project runs its method over its measurements in the background. */
public final class NavigatorView extends ViewPart {

    public static final String ID = "org.tracegas.ui.views.navigator";

    private WorkspaceNavigator navigator;
    private final Consumer<List<BatchQuantificationJob.Outcome>> refresh = outcomes -> {
        if (!navigator.isDisposed()) {
            navigator.viewer().refresh();
        }
    };

    @Override
    public void createPartControl(Composite parent) {
        navigator = new WorkspaceNavigator(parent, SWT.NONE);
        Desk desk = Desk.get();
        // a workspace that was not fresh has no demo model: read what the signed-in user may see
        Workspace model = desk.project() == null
                ? StoredWorkspace.load(desk.access().store(), desk.session(), desk.access().folder().toString())
                : desk.project().model();
        navigator.setWorkspace(model);
        navigator.viewer().addDoubleClickListener(e -> {
            Object o = ((IStructuredSelection) e.getSelection()).getFirstElement();
            if (o instanceof Project p && desk.project() != null && p.getId().equals(desk.project().projectId())) {
                Display display = navigator.getDisplay();
                AnalysisRuns.job(desk.access(), desk.session(), desk.project(),
                        outcomes -> display.asyncExec(() -> desk.runFinished(outcomes))).schedule();
            }
        });
        getSite().setSelectionProvider(navigator.viewer());
        desk.addRunListener(refresh);
    }

    @Override
    public void dispose() {
        Desk.get().removeRunListener(refresh);
        super.dispose();
    }

    @Override
    public void setFocus() {
        navigator.setFocus();
    }
}
