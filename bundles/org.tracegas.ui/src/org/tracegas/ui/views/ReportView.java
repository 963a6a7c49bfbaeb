package org.tracegas.ui.views;

import java.util.function.Consumer;

import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.ui.part.ViewPart;
import org.tracegas.ui.jobs.CampaignReportJob;
import org.tracegas.ui.parts.ReportPanel;
import org.tracegas.ui.session.Desk;

/** The last report the desk made, its signatures and verification, to review and sign, in {@link ReportPanel}. */
public final class ReportView extends ViewPart {

    public static final String ID = "org.tracegas.ui.views.report";

    private ReportPanel panel;
    private final Consumer<CampaignReportJob> listener = job -> {
        if (!panel.isDisposed()) {
            panel.show(job);
        }
    };

    @Override
    public void createPartControl(Composite parent) {
        panel = new ReportPanel(parent, SWT.NONE);
        Desk desk = Desk.get();
        if (desk.lastReport() != null) {
            panel.show(desk.lastReport());
        }
        desk.addReportListener(listener);
    }

    /** The panel shown (for the desk's menu commands). */
    public ReportPanel panel() {
        return panel;
    }

    @Override
    public void dispose() {
        Desk.get().removeReportListener(listener);
        super.dispose();
    }

    @Override
    public void setFocus() {
        panel.setFocus();
    }
}
