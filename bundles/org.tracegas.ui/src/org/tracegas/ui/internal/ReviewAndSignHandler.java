package org.tracegas.ui.internal;

import org.eclipse.core.commands.AbstractHandler;
import org.eclipse.core.commands.ExecutionEvent;
import org.eclipse.core.commands.ExecutionException;
import org.eclipse.ui.PartInitException;
import org.eclipse.ui.handlers.HandlerUtil;
import org.tracegas.ui.views.ResultReviewView;

/** Analysis → Review and sign: brings up the results to sign and opens the signature dialog on the selected one. */
public final class ReviewAndSignHandler extends AbstractHandler {

    @Override
    public Object execute(ExecutionEvent event) throws ExecutionException {
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
