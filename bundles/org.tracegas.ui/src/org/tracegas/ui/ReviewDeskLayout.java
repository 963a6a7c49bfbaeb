package org.tracegas.ui;

import org.eclipse.ui.IFolderLayout;
import org.eclipse.ui.IPageLayout;
import org.eclipse.ui.IPerspectiveFactory;
import org.tracegas.ui.views.AuditTrailView;
import org.tracegas.ui.views.NavigatorView;
import org.tracegas.ui.views.QaOverviewView;
import org.tracegas.ui.views.ReportView;
import org.tracegas.ui.views.ResultReviewView;
import org.tracegas.ui.views.SpectrumView;

/**
 * The QA manager's desk: results to sign and the report to sign at the top, QA outcomes beside them, the audit
 * trail across the bottom, the tree, the selected object's properties and the spectrum for looking things up on
 * the left.
 */
public final class ReviewDeskLayout implements IPerspectiveFactory {

    public static final String ID = "org.tracegas.ui.reviewDesk";

    @Override
    public void createInitialLayout(IPageLayout layout) {
        String area = layout.getEditorArea();
        layout.setEditorAreaVisible(false);
        layout.addView(NavigatorView.ID, IPageLayout.LEFT, 0.18f, area);
        layout.addView(SpectrumView.ID, IPageLayout.BOTTOM, 0.5f, NavigatorView.ID);
        layout.addView(IPageLayout.ID_PROP_SHEET, IPageLayout.BOTTOM, 0.55f, NavigatorView.ID);
        IFolderLayout signing = layout.createFolder("org.tracegas.ui.reviewDesk.signing", IPageLayout.TOP, 0.5f,
                area);
        signing.addView(ResultReviewView.ID);
        signing.addView(ReportView.ID);
        layout.addView(QaOverviewView.ID, IPageLayout.RIGHT, 0.55f, ResultReviewView.ID);
        layout.addView(AuditTrailView.ID, IPageLayout.BOTTOM, 0.5f, area);
    }
}
