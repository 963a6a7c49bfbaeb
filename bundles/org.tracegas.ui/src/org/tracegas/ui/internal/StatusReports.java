package org.tracegas.ui.internal;

import java.util.function.Consumer;

import org.eclipse.core.commands.ExecutionEvent;
import org.eclipse.core.runtime.IStatus;
import org.eclipse.core.runtime.jobs.IJobChangeEvent;
import org.eclipse.core.runtime.jobs.IJobChangeListener;
import org.eclipse.core.runtime.jobs.JobChangeAdapter;
import org.eclipse.jface.dialogs.MessageDialog;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.ui.IViewSite;
import org.eclipse.ui.IWorkbenchPart;
import org.eclipse.ui.handlers.HandlerUtil;

/**
 * How the desk's background jobs tell what they did: the job's closing message in the status line of the view the
 * command came from (a window without one shows it in a dialog). A job that failed also raises the workbench's
 * error dialog, as every user job does.
 */
final class StatusReports {

    private StatusReports() {
    }

    /** Where a command's job reports: the status line of the active view, else an information dialog. */
    static Consumer<String> of(ExecutionEvent event) {
        IWorkbenchPart part = HandlerUtil.getActivePart(event);
        if (part != null && part.getSite() instanceof IViewSite site) {
            return message -> site.getActionBars().getStatusLineManager().setMessage(message);
        }
        Shell shell = HandlerUtil.getActiveShell(event);
        return message -> {
            if (shell != null && !shell.isDisposed()) {
                MessageDialog.openInformation(shell, "Tracegas Workbench", message);
            }
        };
    }

    /** Passes the job's closing message (unless it was cancelled without one) to {@code report} in the UI thread. */
    static IJobChangeListener whenDone(Display display, Consumer<String> report) {
        return new JobChangeAdapter() {
            @Override
            public void done(IJobChangeEvent event) {
                IStatus result = event.getResult();
                String message = result.getSeverity() == IStatus.CANCEL ? event.getJob().getName() + ": cancelled;"
                        + " what was stored stays" : result.getMessage();
                if (!display.isDisposed()) {
                    display.asyncExec(() -> report.accept(message));
                }
            }
        };
    }
}
