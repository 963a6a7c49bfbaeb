package org.tracegas.ui.internal;

import java.nio.file.Path;
import java.util.List;
import java.util.function.Consumer;

import org.eclipse.core.commands.AbstractHandler;
import org.eclipse.core.commands.ExecutionEvent;
import org.eclipse.core.commands.ExecutionException;
import org.eclipse.jface.dialogs.MessageDialog;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.DirectoryDialog;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.FileDialog;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.ui.PartInitException;
import org.eclipse.ui.handlers.HandlerUtil;
import org.tracegas.library.io.FileFormatException;
import org.tracegas.method.StoredMethod;
import org.tracegas.model.ContentVersion;
import org.tracegas.model.Project;
import org.tracegas.model.VersionKind;
import org.tracegas.store.WorkspaceStore;
import org.tracegas.ui.jobs.AnalysisRuns;
import org.tracegas.ui.jobs.CampaignReportJob;
import org.tracegas.ui.session.Desk;
import org.tracegas.ui.views.ReportView;

/**
 * Analysis → Report…: the campaign report of the project selected in the tree, made with a stored method's
 * newest version and a report plan file as the runner's {@code report} command makes it, in the background; the
 * status line then names the files, the content hash signatures are given on, the audit anchor with its
 * verification, the QA readings that failed and the report's caution, and the report's view shows it to sign.
 */
public final class ReportHandler extends AbstractHandler {

    @Override
    public Object execute(ExecutionEvent event) throws ExecutionException {
        Shell shell = HandlerUtil.getActiveShellChecked(event);
        Desk desk = Desk.get();
        WorkspaceStore store = desk.access().store();
        Project project = TreeChoice.project(HandlerUtil.getCurrentSelection(event),
                store.projects().projects(desk.session()));
        if (project == null) {
            MessageDialog.openInformation(shell, "Report", "Select the project in the workspace tree first.");
            return null;
        }
        List<ContentVersion> methods = store.versions().latest(VersionKind.METHOD);
        if (methods.isEmpty()) {
            MessageDialog.openInformation(shell, "Report", "The workspace holds no method yet, so no results to"
                    + " report.");
            return null;
        }
        ContentVersion version = methods.size() == 1 ? methods.get(0) : RunMethodHandler.choose(shell, methods,
                "Report", "The method whose stored results and QA checks the report shows (its newest version):");
        if (version == null) {
            return null;
        }
        FileDialog plan = new FileDialog(shell, SWT.OPEN);
        plan.setText("The report plan of " + project.getCode());
        plan.setFilterExtensions(new String[] {"*.plan", "*"});
        String chosenPlan = plan.open();
        if (chosenPlan == null) {
            return null;
        }
        DirectoryDialog folder = new DirectoryDialog(shell);
        folder.setText("The folder for report.pdf and results.csv of " + project.getCode());
        String chosenFolder = folder.open();
        if (chosenFolder == null) {
            return null;
        }
        try {
            CampaignReportJob.Request request = request(store, project, version, Path.of(chosenPlan),
                    Path.of(chosenFolder));
            // the report's view shows it with its signatures when written, and signs it
            HandlerUtil.getActiveWorkbenchWindowChecked(event).getActivePage().showView(ReportView.ID);
            schedule(request, shell.getDisplay(), StatusReports.of(event));
        } catch (FileFormatException e) {
            MessageDialog.openError(shell, "Report", e.getMessage());
        } catch (PartInitException e) {
            throw new ExecutionException("the report's view could not be opened", e);
        }
        return null;
    }

    /**
     * The report of a method version rebuilt from its stored text, made on the desk's workspace as the desk's user.
     *
     * @throws FileFormatException if the stored method text cannot be read
     */
    public static CampaignReportJob.Request request(WorkspaceStore store, Project project, ContentVersion version,
            Path plan, Path folder) throws FileFormatException {
        return new CampaignReportJob.Request(store, Desk.get().session(), project, version,
                StoredMethod.parse(store.versions().content(version.getId()), "method version " + version.getId()),
                plan, folder);
    }

    /**
     * Starts the report job; the desk is told of the report written ({@link Desk#reportMade}) before the closing
     * message is passed on.
     *
     * @param report receives the closing message in the UI thread
     */
    public static CampaignReportJob schedule(CampaignReportJob.Request request, Display display,
            Consumer<String> report) {
        CampaignReportJob job = new CampaignReportJob(request, AnalysisRuns.software());
        job.addJobChangeListener(StatusReports.whenDone(display, message -> {
            if (job.outcome() != null) {
                Desk.get().reportMade(job);
            }
            report.accept(message);
        }));
        job.schedule();
        return job;
    }
}
