package org.tracegas.ui.views;

import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.ui.part.ViewPart;
import org.tracegas.ui.parts.AuditTrailPanel;
import org.tracegas.ui.session.Desk;

/** The audit trail with its chain verification, in {@link AuditTrailPanel}. */
public final class AuditTrailView extends ViewPart {

    public static final String ID = "org.tracegas.ui.views.auditTrail";

    private AuditTrailPanel panel;

    @Override
    public void createPartControl(Composite parent) {
        panel = new AuditTrailPanel(parent, SWT.NONE);
        if (Desk.get().access() != null) {
            panel.setWorkspace(Desk.get().access(), Desk.get().session());
        }
    }

    @Override
    public void setFocus() {
        panel.setFocus();
    }
}
