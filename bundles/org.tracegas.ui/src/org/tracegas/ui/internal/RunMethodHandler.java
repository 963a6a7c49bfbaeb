package org.tracegas.ui.internal;

import org.eclipse.core.commands.AbstractHandler;
import org.eclipse.core.commands.ExecutionEvent;
import org.eclipse.core.commands.ExecutionException;
import org.eclipse.jface.dialogs.MessageDialog;
import org.eclipse.ui.handlers.HandlerUtil;
import org.tracegas.ui.jobs.AnalysisRuns;
import org.tracegas.ui.session.Desk;

/**
 * Analysis → Run method: runs the desk's project through its method in a background job, as double-clicking
 * it in the tree does; on a workspace the desk holds no method model for, says which runner command does it.
 */
public final class RunMethodHandler extends AbstractHandler {

    @Override
    public Object execute(ExecutionEvent event) throws ExecutionException {
        Desk desk = Desk.get();
        if (desk.project() == null) {
            MessageDialog.openInformation(HandlerUtil.getActiveShellChecked(event), "Tracegas Workbench",
                    RunnerCommandHandler.message("quantify"));
            return null;
        }
        AnalysisRuns.runOnDesk(HandlerUtil.getActiveShellChecked(event).getDisplay());
        return null;
    }
}
