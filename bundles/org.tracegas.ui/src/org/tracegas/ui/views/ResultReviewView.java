package org.tracegas.ui.views;


import org.eclipse.jface.viewers.ISelection;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.ui.ISelectionListener;
import org.eclipse.ui.IWorkbenchPart;
import org.eclipse.ui.part.ViewPart;
import org.tracegas.model.Project;
import org.tracegas.ui.parts.ResultReviewPanel;
import org.tracegas.ui.session.Desk;

/**
 * The results of the project selected in the navigator (or of the selected measurement's project) for review
 * and signing, in {@link ResultReviewPanel}; at first the demo's project.
 */
public final class ResultReviewView extends ViewPart implements FollowsTree {

    public static final String ID = "org.tracegas.ui.views.resultReview";

    private ResultReviewPanel panel;
    private String openProjectId;
    /** After the desk stored results: those of the project shown read again. */
    private final Runnable reread = () -> {
        if (!panel.isDisposed() && openProjectId != null) {
            panel.reload();
        }
    };
    private final ISelectionListener projectListener = this::selected;

    @Override
    public void createPartControl(Composite parent) {
        createContent(parent);
        getSite().getPage().addSelectionListener(NavigatorView.ID, projectListener);
    }

    /** The panel and its feeds, without the workbench site (so that it can be shown in any shell). */
    ResultReviewPanel createContent(Composite parent) {
        panel = new ResultReviewPanel(parent, SWT.NONE);
        Desk.get().addStoreListener(reread);
        return panel;
    }

    /** Opens the results of the selected project, unless they are open already. */
    @Override
    public void selected(IWorkbenchPart part, ISelection selection) {
        Project project = Selections.project(selection);
        if (panel.isDisposed() || project == null || project.getId().equals(openProjectId)) {
            return;
        }
        Desk desk = Desk.get();
        openProjectId = project.getId();
        panel.open(desk.access(), desk.session(), openProjectId, project.getCode());
    }

    /** The panel shown (for the desk's menu commands). */
    public ResultReviewPanel panel() {
        return panel;
    }

    @Override
    public void dispose() {
        getSite().getPage().removeSelectionListener(NavigatorView.ID, projectListener);
        Desk.get().removeStoreListener(reread);
        super.dispose();
    }

    @Override
    public void setFocus() {
        panel.setFocus();
    }
}
