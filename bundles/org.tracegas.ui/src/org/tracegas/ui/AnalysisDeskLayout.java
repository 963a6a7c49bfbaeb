package org.tracegas.ui;

import org.eclipse.ui.IFolderLayout;
import org.eclipse.ui.IPageLayout;
import org.eclipse.ui.IPerspectiveFactory;
import org.tracegas.ui.views.LibraryView;
import org.tracegas.ui.views.MethodEditorView;
import org.tracegas.ui.views.NavigatorView;
import org.tracegas.ui.views.SpectrumView;
import org.tracegas.ui.views.TimeSeriesView;

/**
 * The analyst's desk: workspace tree on the left, the fitted spectrum in the middle with the concentrations
 * over time beneath it, method editor and library on the right.
 */
public final class AnalysisDeskLayout implements IPerspectiveFactory {

    public static final String ID = "org.tracegas.ui.analysisDesk";

    @Override
    public void createInitialLayout(IPageLayout layout) {
        String area = layout.getEditorArea();
        layout.setEditorAreaVisible(false);
        layout.addView(NavigatorView.ID, IPageLayout.LEFT, 0.2f, area);
        layout.addView(SpectrumView.ID, IPageLayout.TOP, 0.62f, area);
        layout.addView(TimeSeriesView.ID, IPageLayout.BOTTOM, 0.62f, SpectrumView.ID);
        IFolderLayout right = layout.createFolder("org.tracegas.ui.analysisDesk.right", IPageLayout.RIGHT, 0.68f,
                SpectrumView.ID);
        right.addView(MethodEditorView.ID);
        right.addView(LibraryView.ID);
    }
}
