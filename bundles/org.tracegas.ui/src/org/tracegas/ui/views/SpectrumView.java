package org.tracegas.ui.views;

import java.util.Optional;

import org.eclipse.jface.viewers.ISelection;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.ui.ISelectionListener;
import org.eclipse.ui.IWorkbenchPart;
import org.eclipse.ui.part.ViewPart;
import org.tracegas.model.Measurement;
import org.tracegas.model.Project;
import org.tracegas.ui.jobs.LatestLoad;
import org.tracegas.ui.parts.FitDisplay;
import org.tracegas.ui.parts.SpectrumPanel;
import org.tracegas.ui.session.Desk;
import org.tracegas.ui.session.MeasurementSpectrum;

/**
 * Draws in {@link SpectrumPanel} the fit of the last measurement run, or the stored spectrum of the measurement
 * selected in the navigator, read in the background.
 */
public final class SpectrumView extends ViewPart implements FollowsTree {

    public static final String ID = "org.tracegas.ui.views.spectrum";

    private SpectrumPanel panel;
    private LatestLoad<Optional<FitDisplay>> loads;
    private final ISelectionListener measurementListener = this::selected;

    @Override
    public void createPartControl(Composite parent) {
        createContent(parent);
        getSite().getPage().addSelectionListener(NavigatorView.ID, measurementListener);
    }

    /** The panel and its feeds, without the workbench site (so that it can be shown in any shell). */
    SpectrumPanel createContent(Composite parent) {
        panel = new SpectrumPanel(parent, SWT.NONE);
        loads = new LatestLoad<>(panel);
        return panel;
    }

    /** Reads the selected measurement's stored spectrum in the background; a later selection wins. */
    @Override
    public void selected(IWorkbenchPart part, ISelection selection) {
        Measurement m = Selections.measurement(selection);
        Project project = Selections.project(selection);
        if (panel.isDisposed() || m == null || project == null) {
            return;
        }
        open(m.getId(), MeasurementSpectrum.label(m.getKind().getLiteral(), m.getTime()) + " of "
                + project.getCode());
    }

    /** Reads and shows the stored spectrum of a measurement, e.g. of a point picked in the time series. */
    public void open(String measurementId, String label) {
        Desk desk = Desk.get();
        panel.showNote("Reading the spectrum of " + label + " …");
        loads.start("Reading the spectrum of " + label,
                monitor -> MeasurementSpectrum.read(desk.access().store(), desk.session(), measurementId,
                        label, monitor),
                fit -> fit.ifPresentOrElse(panel::show,
                        () -> panel.showNote("No spectrum is stored for " + label + ".")),
                message -> panel.showNote("The spectrum of " + label + " could not be read: " + message));
    }

    /** The panel shown. */
    public SpectrumPanel panel() {
        return panel;
    }

    @Override
    public void dispose() {
        getSite().getPage().removeSelectionListener(NavigatorView.ID, measurementListener);
        loads.cancel();
        super.dispose();
    }

    @Override
    public void setFocus() {
        panel.setFocus();
    }
}
