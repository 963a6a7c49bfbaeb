package org.tracegas.ui.internal;

import java.util.List;
import java.util.function.Consumer;

import org.eclipse.core.commands.AbstractHandler;
import org.eclipse.core.commands.ExecutionEvent;
import org.eclipse.core.commands.ExecutionException;
import org.eclipse.jface.window.Window;
import org.eclipse.jface.wizard.WizardDialog;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.ui.handlers.HandlerUtil;
import org.tracegas.importer.ReaderRegistry;
import org.tracegas.model.Project;
import org.tracegas.ui.dialogs.ImportWizard;
import org.tracegas.ui.jobs.FileImportJob;
import org.tracegas.ui.session.Desk;

/**
 * File → Import…: the import wizard, then the import as a job through the store's import service, with the
 * readers contributed to the platform (the runner's readers); when it ends the views read the workspace again
 * and the status line says what was imported and how many files were imported before.
 */
public final class ImportHandler extends AbstractHandler {

    @Override
    public Object execute(ExecutionEvent event) throws ExecutionException {
        Shell shell = HandlerUtil.getActiveShellChecked(event);
        Desk desk = Desk.get();
        List<Project> projects = desk.access().store().projects().projects(desk.session());
        ImportWizard wizard = new ImportWizard(ReaderRegistry.fromPlatform(), projects,
                TreeChoice.project(HandlerUtil.getCurrentSelection(event), projects));
        if (new WizardDialog(shell, wizard).open() == Window.OK) {
            schedule(wizard.request(), ReaderRegistry.fromPlatform(), shell.getDisplay(),
                    StatusReports.of(event));
        }
        return null;
    }

    /**
     * Starts the import of a finished wizard's request on the desk's workspace.
     *
     * @param report receives the summary (or the reason it failed) in the UI thread
     */
    public static FileImportJob schedule(ImportWizard.Request request, ReaderRegistry readers, Display display,
            Consumer<String> report) {
        Desk desk = Desk.get();
        FileImportJob job = new FileImportJob(desk.access().store(), desk.session(), request.project(), readers,
                request.files(), request.defaults(), outcome -> display.asyncExec(desk::storeChanged));
        job.addJobChangeListener(StatusReports.whenDone(display, report));
        job.schedule();
        return job;
    }
}
