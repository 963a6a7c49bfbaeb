package org.tracegas.ui.internal;

import org.eclipse.core.commands.AbstractHandler;
import org.eclipse.core.commands.ExecutionEvent;
import org.eclipse.core.commands.ExecutionException;
import org.eclipse.ui.IWorkbenchPart;
import org.eclipse.ui.PartInitException;
import org.eclipse.ui.handlers.HandlerUtil;
import org.tracegas.ui.views.ReportView;
import org.tracegas.ui.views.ResultReviewView;

/**
 * Analysis → Review and sign: with the report's view active and a report in it, opens the signature dialog on
 * that report; otherwise brings up the results to sign and opens the signature dialog on the selected one.
 */
public final class ReviewAndSignHandler extends AbstractHandler {

    @Override
    public Object execute(ExecutionEvent event) throws ExecutionException {
        IWorkbenchPart active = HandlerUtil.getActivePart(event);
        if (active instanceof ReportView report && report.panel().approval() != null) {
            report.panel().reviewAndSign();
            return null;
        }
        try {
            ResultReviewView view = (ResultReviewView) HandlerUtil.getActiveWorkbenchWindowChecked(event)
                    .getActivePage().showView(ResultReviewView.ID);
            view.panel().reviewSelected();
        } catch (PartInitException e) {
            throw new ExecutionException("the view of results to sign could not be opened", e);
        }
        return null;
    }
}
