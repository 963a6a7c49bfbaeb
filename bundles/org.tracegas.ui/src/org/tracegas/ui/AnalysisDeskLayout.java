package org.tracegas.ui;

import org.eclipse.ui.IFolderLayout;
import org.eclipse.ui.IPageLayout;
import org.eclipse.ui.IPerspectiveFactory;
import org.tracegas.ui.views.AuditTrailView;
import org.tracegas.ui.views.LibraryView;
import org.tracegas.ui.views.MethodEditorView;
import org.tracegas.ui.views.NavigatorView;
import org.tracegas.ui.views.QaOverviewView;
import org.tracegas.ui.views.ReportView;
import org.tracegas.ui.views.ResultReviewView;
import org.tracegas.ui.views.SpectrumView;
import org.tracegas.ui.views.TimeSeriesView;

/**
 * The analyst's desk: workspace tree on the left with the selected object's properties beneath it, the fitted
 * spectrum in the middle with the concentrations over time beneath it, method editor and library on the right,
 * the window high.
 */
public final class AnalysisDeskLayout implements IPerspectiveFactory {

    public static final String ID = "org.tracegas.ui.analysisDesk";

    @Override
    public void createInitialLayout(IPageLayout layout) {
        String area = layout.getEditorArea();
        layout.setEditorAreaVisible(false);
        layout.addView(NavigatorView.ID, IPageLayout.LEFT, 0.2f, area);
        layout.addView(IPageLayout.ID_PROP_SHEET, IPageLayout.BOTTOM, 0.62f, NavigatorView.ID);
        // the method and the library the whole window high: the method's form and its comparison need the height
        IFolderLayout right = layout.createFolder("org.tracegas.ui.analysisDesk.right", IPageLayout.RIGHT, 0.66f,
                area);
        right.addView(MethodEditorView.ID);
        right.addView(LibraryView.ID);
        layout.addView(SpectrumView.ID, IPageLayout.TOP, 0.62f, area);
        // the views the analysis desk opens on demand go beneath the spectrum, where the width is
        IFolderLayout below = layout.createFolder("org.tracegas.ui.analysisDesk.below", IPageLayout.BOTTOM, 0.62f,
                SpectrumView.ID);
        below.addView(TimeSeriesView.ID);
        below.addPlaceholder(AuditTrailView.ID);
        below.addPlaceholder(ReportView.ID);
        below.addPlaceholder(ResultReviewView.ID);
        below.addPlaceholder(QaOverviewView.ID);
    }
}
