package org.tracegas.ui;

import org.eclipse.ui.IPageLayout;
import org.eclipse.ui.IPerspectiveFactory;
import org.tracegas.ui.views.SpectrumView;

/** The analyst's arrangement: workspace tree on the left, the spectrum in the middle. */
public final class AnalysisDeskLayout implements IPerspectiveFactory {

    public static final String ID = "org.tracegas.ui.analysisDesk";

    @Override
    public void createInitialLayout(IPageLayout layout) {
        layout.setEditorAreaVisible(false);
        layout.addStandaloneView(SpectrumView.ID, true, IPageLayout.TOP, 1.0f, layout.getEditorArea());
    }
}
