package org.tracegas.ui.views;


import org.eclipse.core.commands.common.CommandException;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.ui.IViewPart;
import org.eclipse.ui.PartInitException;
import org.eclipse.ui.handlers.IHandlerService;
import org.eclipse.ui.part.ViewPart;
import org.eclipse.ui.views.properties.IPropertySheetPage;
import org.eclipse.ui.views.properties.PropertySheetPage;
import org.tracegas.model.Measurement;
import org.tracegas.model.Project;
import org.tracegas.model.Workspace;
import org.tracegas.ui.items.ItemProperties;
import org.tracegas.ui.jobs.LatestLoad;
import org.tracegas.ui.parts.WorkspaceNavigator;
import org.tracegas.ui.session.Desk;
import org.tracegas.ui.session.StoredWorkspace;

/**
 * The workspace tree; double-clicking the demo project runs its method over its measurements in the background,
 * and the context menu runs a stored method over the selected measurements. The tree is read again when the
 * desk stores measurements or results. The properties view shows the selected object's features through the same
 * item providers as the tree, read only.
 */
public final class NavigatorView extends ViewPart {

    public static final String ID = "org.tracegas.ui.views.navigator";
    /** The command that runs a method over the tree's selection. */
    static final String RUN_METHOD = "org.tracegas.ui.commands.runMethod";

    private WorkspaceNavigator navigator;
    private LatestLoad<Workspace> loads;
    /** After the desk stored measurements or results: the tree read again, its project selected again. */
    private final Runnable reread = () -> {
        if (!navigator.isDisposed()) {
            Project selected = Selections.project(navigator.viewer().getSelection());
            read(selected == null ? null : selected.getCode());
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
        navigator.addMenuAction(new WorkspaceNavigator.MenuAction("Run method on the selection…",
                o -> o instanceof Project || o instanceof Measurement, o -> {
                    try {
                        getSite().getService(IHandlerService.class).executeCommand(RUN_METHOD, null);
                    } catch (CommandException e) {
                        navigator.showNote("The method could not be run: " + e.getMessage());
                    }
                }));
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
        navigator.showNote("Reading the " + desk.access().location().description() + " …");
        read(null);
        desk.addStoreListener(reread);
        return navigator;
    }

    /**
     * Reads the workspace's tree: what the signed-in user may see, in the background, so that the window stays responsive on a large workspace; then selects the project of that
     * code again, if one is given.
     */
    private void read(String projectCode) {
        Desk desk = Desk.get();
        String name = desk.access().location().description();
        loads.start("Reading the workspace tree",
                monitor -> StoredWorkspace.load(desk.access().store(), desk.session(), name, monitor), w -> {
                    navigator.setWorkspace(w);
                    if (projectCode != null) {
                        navigator.openProject(projectCode);
                    }
                }, message -> navigator.showNote("The workspace could not be read: " + message));
    }

    /** The properties view's page while this view is active: the selected model object's features. */
    @Override
    public <T> T getAdapter(Class<T> adapter) {
        if (adapter == IPropertySheetPage.class) {
            return adapter.cast(propertiesPage(navigator));
        }
        return super.getAdapter(adapter);
    }

    /** A properties page showing what is selected in the navigator through its item providers. */
    static PropertySheetPage propertiesPage(WorkspaceNavigator navigator) {
        PropertySheetPage page = new PropertySheetPage();
        page.setPropertySourceProvider(o -> ItemProperties.of(navigator.adapters(), o));
        return page;
    }

    @Override
    public void dispose() {
        Desk.get().removeStoreListener(reread);
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
