package org.tracegas.ui.internal;

import java.nio.file.Path;
import java.util.function.Consumer;

import org.eclipse.core.commands.AbstractHandler;
import org.eclipse.core.commands.ExecutionEvent;
import org.eclipse.core.commands.ExecutionException;
import org.eclipse.jface.dialogs.MessageDialog;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.FileDialog;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.ui.handlers.HandlerUtil;
import org.tracegas.model.Project;
import org.tracegas.ui.jobs.ResultsExportJob;
import org.tracegas.ui.session.Desk;

/**
 * File → Export results…: the stored results of the project selected in the tree as CSV, through the runner's
 * export code, in the background; the status line then says where they went and the file's SHA-256.
 */
public final class ExportResultsHandler extends AbstractHandler {

    @Override
    public Object execute(ExecutionEvent event) throws ExecutionException {
        Shell shell = HandlerUtil.getActiveShellChecked(event);
        Desk desk = Desk.get();
        Project project = TreeChoice.project(HandlerUtil.getCurrentSelection(event),
                desk.access().store().projects().projects(desk.session()));
        if (project == null) {
            MessageDialog.openInformation(shell, "Export results", "Select the project in the workspace tree first.");
            return null;
        }
        FileDialog d = new FileDialog(shell, SWT.SAVE);
        d.setText("Export the results of " + project.getCode());
        d.setFilterExtensions(new String[] {"*.csv"});
        d.setFileName(project.getCode() + "-results.csv");
        d.setOverwrite(true);
        String chosen = d.open();
        if (chosen != null) {
            schedule(project, Path.of(chosen), shell.getDisplay(), StatusReports.of(event));
        }
        return null;
    }

    /**
     * Starts the export on the desk's workspace as the desk's user.
     *
     * @param report receives the closing message in the UI thread
     */
    public static ResultsExportJob schedule(Project project, Path out, Display display, Consumer<String> report) {
        Desk desk = Desk.get();
        ResultsExportJob job = new ResultsExportJob(desk.access().store(), desk.session(), project, out);
        job.addJobChangeListener(StatusReports.whenDone(display, report));
        job.schedule();
        return job;
    }
}
