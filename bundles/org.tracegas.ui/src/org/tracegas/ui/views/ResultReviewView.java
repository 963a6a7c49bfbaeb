package org.tracegas.ui.views;

import java.util.List;
import java.util.function.Consumer;

import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.ui.part.ViewPart;
import org.tracegas.ui.jobs.BatchQuantificationJob;
import org.tracegas.ui.parts.ResultReviewPanel;
import org.tracegas.ui.session.DemoProject;
import org.tracegas.ui.session.Desk;

/** The project's results for review and signing, in {@link ResultReviewPanel}. */
public final class ResultReviewView extends ViewPart {

    public static final String ID = "org.tracegas.ui.views.resultReview";

    private ResultReviewPanel panel;
    private final Consumer<List<BatchQuantificationJob.Outcome>> listener = outcomes -> {
        if (!panel.isDisposed()) {
            panel.reload();
        }
    };

    @Override
    public void createPartControl(Composite parent) {
        panel = new ResultReviewPanel(parent, SWT.NONE);
        Desk desk = Desk.get();
        if (desk.project() != null) {
            panel.open(desk.access(), desk.session(), desk.project().projectId(), DemoProject.PROJECT_CODE);
            desk.addRunListener(listener);
        }
    }

    @Override
    public void dispose() {
        Desk.get().removeRunListener(listener);
        super.dispose();
    }

    @Override
    public void setFocus() {
        panel.setFocus();
    }
}
