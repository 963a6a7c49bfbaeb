package org.tracegas.ui.internal;

import java.util.List;
import java.util.Set;
import java.util.function.Consumer;

import org.eclipse.core.commands.AbstractHandler;
import org.eclipse.core.commands.ExecutionEvent;
import org.eclipse.core.commands.ExecutionException;
import org.eclipse.core.runtime.RegistryFactory;
import org.eclipse.jface.dialogs.MessageDialog;
import org.eclipse.jface.viewers.ISelection;
import org.eclipse.jface.viewers.LabelProvider;
import org.eclipse.jface.window.Window;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.ui.dialogs.ElementListSelectionDialog;
import org.eclipse.ui.handlers.HandlerUtil;
import org.tracegas.library.io.FileFormatException;
import org.tracegas.method.StoredMethod;
import org.tracegas.model.ContentVersion;
import org.tracegas.model.Project;
import org.tracegas.model.VersionKind;
import org.tracegas.preprocess.StepRegistry;
import org.tracegas.store.WorkspaceStore;
import org.tracegas.ui.jobs.AnalysisRuns;
import org.tracegas.ui.jobs.StoredMethodRunJob;
import org.tracegas.ui.session.Desk;

/**
 * Analysis → Run method (and the tree's context menu): on a stored workspace, runs a stored method version over
 * the measurements selected in the tree (a selected project: all of its) as a job through the runner's
 * quantification service, skipping those analysed with the version before; the views then read the stored
 * results again. On the desk's demo project, runs its method as double-clicking it in the tree does.
 */
public final class RunMethodHandler extends AbstractHandler {

    @Override
    public Object execute(ExecutionEvent event) throws ExecutionException {
        Shell shell = HandlerUtil.getActiveShellChecked(event);
        Desk desk = Desk.get();
        WorkspaceStore store = desk.access().store();
        ISelection selection = HandlerUtil.getCurrentSelection(event);
        Project project = TreeChoice.project(selection, store.projects().projects(desk.session()));
        if (project == null) {
            MessageDialog.openInformation(shell, "Run method", "Select a project, or some of its measurements, in"
                    + " the workspace tree first.");
            return null;
        }
        List<ContentVersion> methods = store.versions().latest(VersionKind.METHOD);
        if (methods.isEmpty()) {
            MessageDialog.openInformation(shell, "Run method", "The workspace holds no method yet; define one with"
                    + " 'tracegas method-define'.");
            return null;
        }
        ContentVersion version = methods.size() == 1 ? methods.get(0) : choose(shell, methods, "Run method",
                "The method to run (its newest version):");
        if (version == null) {
            return null;
        }
        try {
            schedule(target(store, project, version), Set.copyOf(TreeChoice.measurementIds(selection, project)),
                    shell.getDisplay(), StatusReports.of(event));
        } catch (FileFormatException e) {
            MessageDialog.openError(shell, "Run method", e.getMessage());
        }
        return null;
    }

    /** The method the user picks among the newest versions of the workspace's methods; null when cancelled. */
    static ContentVersion choose(Shell shell, List<ContentVersion> methods, String title, String message) {
        ElementListSelectionDialog d = new ElementListSelectionDialog(shell, new LabelProvider() {
            @Override
            public String getText(Object element) {
                ContentVersion v = (ContentVersion) element;
                return v.getItemName() + " — version " + v.getNumber();
            }
        });
        d.setTitle(title);
        d.setMessage(message);
        d.setElements(methods.toArray());
        d.setMultipleSelection(false);
        return d.open() == Window.OK ? (ContentVersion) d.getFirstResult() : null;
    }

    /**
     * The method version rebuilt from its stored text, to run on the desk's workspace as the desk's user.
     *
     * @throws FileFormatException if the stored text cannot be read
     */
    public static StoredMethodRunJob.Target target(WorkspaceStore store, Project project, ContentVersion version)
            throws FileFormatException {
        return new StoredMethodRunJob.Target(store, Desk.get().session(), project, version,
                StoredMethod.parse(store.versions().content(version.getId()), "method version " + version.getId()));
    }

    /**
     * Starts a run with the recipe steps contributed to the platform (the runner's steps).
     *
     * @param chosen the measurements to run over; empty for all of the project's
     * @param report receives the closing message in the UI thread
     */
    public static StoredMethodRunJob schedule(StoredMethodRunJob.Target target, Set<String> chosen, Display display,
            Consumer<String> report) {
        StoredMethodRunJob job = new StoredMethodRunJob(target, StepRegistry.fromExtensions(
                RegistryFactory.getRegistry()), AnalysisRuns.software(), chosen,
                outcome -> display.asyncExec(Desk.get()::storeChanged));
        job.addJobChangeListener(StatusReports.whenDone(display, report));
        job.schedule();
        return job;
    }
}
