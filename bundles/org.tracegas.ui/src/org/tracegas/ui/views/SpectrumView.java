package org.tracegas.ui.views;

import java.util.List;
import java.util.function.Consumer;

import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.ui.part.ViewPart;
import org.tracegas.ui.jobs.AnalysisRuns;
import org.tracegas.ui.jobs.BatchQuantificationJob;
import org.tracegas.ui.parts.SpectrumPanel;
import org.tracegas.ui.session.Desk;

/** The fit of the last measurement run, drawn by {@link SpectrumPanel}. */
public final class SpectrumView extends ViewPart {

    public static final String ID = "org.tracegas.ui.views.spectrum";

    private SpectrumPanel panel;
    private final Consumer<List<BatchQuantificationJob.Outcome>> listener = this::show;

    @Override
    public void createPartControl(Composite parent) {
        panel = new SpectrumPanel(parent, SWT.NONE);
        show(Desk.get().lastRun());
        Desk.get().addRunListener(listener);
    }

    private void show(List<BatchQuantificationJob.Outcome> outcomes) {
        if (!outcomes.isEmpty() && !panel.isDisposed()) {
            panel.show(AnalysisRuns.fit(outcomes.get(outcomes.size() - 1)));
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
