package org.tracegas.ui.views;

import java.util.List;
import java.util.function.Consumer;

import org.eclipse.jface.viewers.ISelection;
import org.eclipse.jface.viewers.IStructuredSelection;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.ui.ISelectionListener;
import org.eclipse.ui.IWorkbenchPart;
import org.eclipse.ui.part.ViewPart;
import org.tracegas.model.Project;
import org.tracegas.ui.jobs.AnalysisRuns;
import org.tracegas.ui.jobs.BatchQuantificationJob;
import org.tracegas.ui.parts.TimeSeriesPanel;
import org.tracegas.ui.session.DemoProject;
import org.tracegas.ui.session.Desk;
import org.tracegas.ui.session.StoredResults;

/**
 * Concentrations over time, drawn by {@link TimeSeriesPanel}: those of the last run, or the stored results of
 * the project selected in the navigator.
 */
public final class TimeSeriesView extends ViewPart {

    public static final String ID = "org.tracegas.ui.views.timeSeries";

    private TimeSeriesPanel panel;
    private final Consumer<List<BatchQuantificationJob.Outcome>> listener = this::show;
    private final ISelectionListener projectListener = this::selected;

    @Override
    public void createPartControl(Composite parent) {
        panel = new TimeSeriesPanel(parent, SWT.NONE);
        show(Desk.get().lastRun());
        Desk.get().addRunListener(listener);
        getSite().getPage().addSelectionListener(NavigatorView.ID, projectListener);
    }

    private void show(List<BatchQuantificationJob.Outcome> outcomes) {
        DemoProject.Seeded p = Desk.get().project();
        if (outcomes.isEmpty() || p == null || panel.isDisposed()) {
            return;
        }
        panel.show("Concentrations of " + DemoProject.PROJECT_CODE + ", hours from the first measurement",
                AnalysisRuns.traces(outcomes, p.measurementTimes(), p.measurementTimes().get(0)), List.of());
    }

    private void selected(IWorkbenchPart part, ISelection selection) {
        if (panel.isDisposed() || !(selection instanceof IStructuredSelection s)
                || !(s.getFirstElement() instanceof Project project)) {
            return;
        }
        Desk desk = Desk.get();
        StoredResults.Traces stored = StoredResults.traces(desk.access().store(), desk.session(), project.getId());
        if (!stored.traces().isEmpty()) {
            panel.show(StoredResults.title(project.getCode(), stored), stored.traces(), List.of());
        }
    }

    @Override
    public void dispose() {
        getSite().getPage().removeSelectionListener(NavigatorView.ID, projectListener);
        Desk.get().removeRunListener(listener);
        super.dispose();
    }

    @Override
    public void setFocus() {
        panel.setFocus();
    }
}
