package org.tracegas.ui.views;

import java.util.List;
import java.util.function.Consumer;

import org.eclipse.jface.viewers.ISelection;
import org.eclipse.jface.viewers.IStructuredSelection;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.ui.ISelectionListener;
import org.eclipse.ui.IWorkbenchPart;
import org.eclipse.ui.PartInitException;
import org.eclipse.ui.part.ViewPart;
import org.tracegas.model.Project;
import org.tracegas.ui.chart.ClockTime;
import org.tracegas.ui.jobs.LatestLoad;
import org.tracegas.ui.parts.TimeSeriesPanel;
import org.tracegas.ui.session.Desk;
import org.tracegas.ui.session.StoredResults;

/**
 * Concentrations over time, drawn by {@link TimeSeriesPanel}: those of the last run, or the stored results of
 * the project selected in the navigator.
 */
public final class TimeSeriesView extends ViewPart implements FollowsTree {

    public static final String ID = "org.tracegas.ui.views.timeSeries";

    private TimeSeriesPanel panel;
    private LatestLoad<StoredResults.Traces> loads;
    private final ISelectionListener projectListener = this::selected;
    private String shownProjectId;
    private java.time.Instant shownStart;
    private String shownProjectCode;
    /** After the desk stored results: those of the project shown read again. */
    private final Runnable reread = () -> {
        if (shownProjectId != null && !panel.isDisposed()) {
            read(shownProjectId, shownProjectCode);
        }
    };
    /** Opens a picked value's spectrum; in the workbench, in the spectrum view. */
    Consumer<TimeSeriesPanel.Pick> spectrumOpener = this::openInSpectrumView;

    @Override
    public void createPartControl(Composite parent) {
        createContent(parent);
        getSite().getPage().addSelectionListener(NavigatorView.ID, projectListener);
    }

    /** The panel and its feeds, without the workbench site (so that it can be shown in any shell). */
    TimeSeriesPanel createContent(Composite parent) {
        panel = new TimeSeriesPanel(parent, SWT.NONE);
        loads = new LatestLoad<>(panel);
        panel.addPointOpener(pick -> spectrumOpener.accept(pick));
        Desk.get().addStoreListener(reread);
        return panel;
    }

    /** Reads the selected project's stored results in the background; a later selection wins. */
    @Override
    public void selected(IWorkbenchPart part, ISelection selection) {
        if (panel.isDisposed() || !(selection instanceof IStructuredSelection s)
                || !(s.getFirstElement() instanceof Project project)) {
            return;
        }
        read(project.getId(), project.getCode());
    }

    /** Reads a project's stored results in the background; a later request wins. */
    private void read(String id, String code) {
        Desk desk = Desk.get();
        shownProjectId = id;
        shownProjectCode = code;
        panel.showNote("Reading the stored results of " + code + " …");
        loads.start("Reading the stored results of " + code,
                monitor -> StoredResults.traces(desk.access().store(), desk.session(), id, monitor),
                stored -> showStored(stored, code),
                message -> panel.showNote("The stored results of " + code + " could not be read: " + message));
    }

    /** Brings up the spectrum view with the stored spectrum of the picked value's measurement. */
    private void openInSpectrumView(TimeSeriesPanel.Pick pick) {
        try {
            SpectrumView view = (SpectrumView) getSite().getPage().showView(SpectrumView.ID);
            view.open(pick.trace().measurementIds().get(pick.index()), label(pick));
        } catch (PartInitException e) {
            panel.showNote("The spectrum view could not be opened: " + e.getMessage());
        }
    }

    /** What the spectrum view calls the picked value's measurement. */
    String label(TimeSeriesPanel.Pick pick) {
        return pick.trace().compound() + " value at " + new ClockTime(shownStart, 0).full(pick.trace().hours()[pick
                .index()]) + " of " + shownProjectCode;
    }

    private void showStored(StoredResults.Traces stored, String code) {
        if (stored.traces().isEmpty()) {
            panel.showNote("No stored results for " + code + " yet.");
        } else {
            shownStart = stored.start();
            panel.show(StoredResults.title(code, stored), stored.traces(), List.of(), stored.start());
        }
    }

    /** The panel shown. */
    public TimeSeriesPanel panel() {
        return panel;
    }

    @Override
    public void dispose() {
        getSite().getPage().removeSelectionListener(NavigatorView.ID, projectListener);
        loads.cancel();
        Desk.get().removeStoreListener(reread);
        super.dispose();
    }

    @Override
    public void setFocus() {
        panel.setFocus();
    }
}
