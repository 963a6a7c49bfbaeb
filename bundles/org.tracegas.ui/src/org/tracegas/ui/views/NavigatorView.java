package org.tracegas.ui.views;

import java.util.List;
import java.util.function.Consumer;

import org.eclipse.jface.viewers.IStructuredSelection;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.ui.IViewPart;
import org.eclipse.ui.PartInitException;
import org.eclipse.ui.part.ViewPart;
import org.tracegas.model.Measurement;
import org.tracegas.model.Project;
import org.tracegas.model.Workspace;
import org.tracegas.ui.jobs.AnalysisRuns;
import org.tracegas.ui.jobs.BatchQuantificationJob;
import org.tracegas.ui.jobs.LatestLoad;
import org.tracegas.ui.parts.WorkspaceNavigator;
import org.tracegas.ui.session.Desk;
import org.tracegas.ui.session.StoredWorkspace;

/** The workspace tree; double-clicking a project runs its method over its measurements in the background. */
public final class NavigatorView extends ViewPart {

    public static final String ID = "org.tracegas.ui.views.navigator";

    private WorkspaceNavigator navigator;
    private LatestLoad<Workspace> loads;
    private final Consumer<List<BatchQuantificationJob.Outcome>> refresh = outcomes -> {
        if (!navigator.isDisposed()) {
            navigator.viewer().refresh();
        }
    };

    @Override
    public void createPartControl(Composite parent) {
        createContent(parent);
        getSite().setSelectionProvider(navigator.viewer());
        offer("Open spectrum and fit", Measurement.class, SpectrumView.ID);
        offer("Show concentrations over time", Project.class, TimeSeriesView.ID);
        offer("Show results to sign", Project.class, ResultReviewView.ID);
        offer("Show QA checks", Project.class, QaOverviewView.ID);
        offer("Show QA checks of its project", Measurement.class, QaOverviewView.ID);
    }

    /**
     * A context-menu entry bringing up a view for an element of a type; the view, perhaps opened just now, is
     * handed the tree's selection at once.
     */
    private void offer(String label, Class<?> type, String viewId) {
        navigator.addMenuAction(new WorkspaceNavigator.MenuAction(label, type::isInstance, element -> {
            try {
                IViewPart view = getSite().getPage().showView(viewId);
                if (view instanceof FollowsTree follower) {
                    follower.selected(this, navigator.viewer().getSelection());
                }
            } catch (PartInitException e) {
                navigator.showNote("The view could not be opened: " + e.getMessage());
            }
        }));
    }

    /** The tree and its loading, without the workbench site (so that it can be shown in any shell). */
    WorkspaceNavigator createContent(Composite parent) {
        navigator = new WorkspaceNavigator(parent, SWT.NONE);
        loads = new LatestLoad<>(navigator);
        Desk desk = Desk.get();
        if (desk.project() != null) {
            navigator.setWorkspace(desk.project().model());
        } else {
            // a workspace that was not fresh has no demo model: read what the signed-in user may see, in the
            // background, so that the window stays responsive on a large workspace
            String name = desk.access().location().description();
            navigator.showNote("Reading the " + name + " …");
            loads.start("Reading the workspace tree",
                    monitor -> StoredWorkspace.load(desk.access().store(), desk.session(), name, monitor),
                    navigator::setWorkspace, message -> navigator.showNote("The workspace could not be read: "
                            + message));
        }
        navigator.viewer().addDoubleClickListener(e -> {
            Object o = ((IStructuredSelection) e.getSelection()).getFirstElement();
            if (o instanceof Project p && desk.project() != null && p.getId().equals(desk.project().projectId())) {
                AnalysisRuns.runOnDesk(navigator.getDisplay());
            }
        });
        desk.addRunListener(refresh);
        return navigator;
    }

    @Override
    public void dispose() {
        Desk.get().removeRunListener(refresh);
        if (loads != null) {
            loads.cancel();
        }
        super.dispose();
    }

    @Override
    public void setFocus() {
        navigator.setFocus();
    }
}
