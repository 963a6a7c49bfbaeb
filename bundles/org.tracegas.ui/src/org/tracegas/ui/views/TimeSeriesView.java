package org.tracegas.ui.views;

import java.util.List;
import java.util.function.Consumer;

import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.ui.part.ViewPart;
import org.tracegas.ui.jobs.AnalysisRuns;
import org.tracegas.ui.jobs.BatchQuantificationJob;
import org.tracegas.ui.parts.TimeSeriesPanel;
import org.tracegas.ui.session.DemoProject;
import org.tracegas.ui.session.Desk;

/** Concentrations of the last run over time, drawn by {@link TimeSeriesPanel}. */
public final class TimeSeriesView extends ViewPart {

    public static final String ID = "org.tracegas.ui.views.timeSeries";

    private TimeSeriesPanel panel;
    private final Consumer<List<BatchQuantificationJob.Outcome>> listener = this::show;

    @Override
    public void createPartControl(Composite parent) {
        panel = new TimeSeriesPanel(parent, SWT.NONE);
        show(Desk.get().lastRun());
        Desk.get().addRunListener(listener);
    }

    private void show(List<BatchQuantificationJob.Outcome> outcomes) {
        DemoProject.Seeded p = Desk.get().project();
        if (outcomes.isEmpty() || p == null || panel.isDisposed()) {
            return;
        }
        panel.show("Concentrations of " + DemoProject.PROJECT_CODE + ", hours from the first measurement",
                AnalysisRuns.traces(outcomes, p.measurementTimes(), p.measurementTimes().get(0)), List.of());
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
