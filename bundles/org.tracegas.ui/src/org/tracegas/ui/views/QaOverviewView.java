package org.tracegas.ui.views;

import java.util.List;

import org.eclipse.jface.viewers.ISelection;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.ui.ISelectionListener;
import org.eclipse.ui.IWorkbenchPart;
import org.eclipse.ui.part.ViewPart;
import org.tracegas.qa.campaign.StoredQaChecks;
import org.tracegas.model.Project;
import org.tracegas.model.QaOutcome;
import org.tracegas.qa.checks.CheckOutcome;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;
import org.tracegas.ui.jobs.LatestLoad;
import org.tracegas.ui.parts.QaOverviewPanel;
import org.tracegas.ui.session.Desk;

/**
 * QA check outcomes in {@link QaOverviewPanel}: those stored for the project selected in the navigator (or
 * for the project of the selected measurement), read in the background; at first the demo's checks.
 */
public final class QaOverviewView extends ViewPart implements FollowsTree {

    public static final String ID = "org.tracegas.ui.views.qaOverview";

    private QaOverviewPanel panel;
    private LatestLoad<List<CheckOutcome>> loads;
    private final ISelectionListener projectListener = this::selected;

    @Override
    public void createPartControl(Composite parent) {
        createContent(parent);
        getSite().getPage().addSelectionListener(NavigatorView.ID, projectListener);
    }

    /** The panel and its feed, without the workbench site (so that it can be shown in any shell). */
    QaOverviewPanel createContent(Composite parent) {
        panel = new QaOverviewPanel(parent, SWT.NONE);
        loads = new LatestLoad<>(panel);
        panel.showNote("Select a project in the workspace tree to see its stored QA checks.");
        return panel;
    }

    /** Reads the stored QA outcomes of the selected project in the background; a later selection wins. */
    @Override
    public void selected(IWorkbenchPart part, ISelection selection) {
        Project project = Selections.project(selection);
        if (panel.isDisposed() || project == null) {
            return;
        }
        Desk desk = Desk.get();
        String id = project.getId();
        String code = project.getCode();
        panel.showNote("Reading the QA checks of " + code + " …");
        loads.start("Reading the QA checks of " + code, monitor -> stored(desk.access().store(), desk.session(), id),
                outcomes -> panel.show(code, outcomes),
                message -> panel.showNote("The QA checks of " + code + " could not be read: " + message));
    }

    /** The project's stored outcomes, grouped by the method version that judged them, as recorded. */
    private static List<CheckOutcome> stored(WorkspaceStore store, Session actor, String projectId) {
        return store.qa().checks(actor, projectId).stream().map(QaOutcome::getMethodVersionId).distinct()
                .flatMap(version -> StoredQaChecks.load(store, actor, projectId, version).stream()).toList();
    }

    /** The panel shown. */
    public QaOverviewPanel panel() {
        return panel;
    }

    @Override
    public void dispose() {
        getSite().getPage().removeSelectionListener(NavigatorView.ID, projectListener);
        loads.cancel();
        super.dispose();
    }

    @Override
    public void setFocus() {
        panel.setFocus();
    }
}
