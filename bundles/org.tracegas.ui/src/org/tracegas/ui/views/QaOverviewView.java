package org.tracegas.ui.views;

import org.eclipse.core.runtime.preferences.InstanceScope;
import org.eclipse.jface.preference.IPreferenceStore;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.ui.part.ViewPart;
import org.eclipse.ui.preferences.ScopedPreferenceStore;
import org.tracegas.ui.parts.QaOverviewPanel;
import org.tracegas.ui.prefs.DeskPreferences;
import org.tracegas.ui.session.DemoProject;
import org.tracegas.ui.session.Desk;

/** QA check outcomes of the project's measurements in {@link QaOverviewPanel}. */
public final class QaOverviewView extends ViewPart {

    public static final String ID = "org.tracegas.ui.views.qaOverview";

    private QaOverviewPanel panel;

    @Override
    public void createPartControl(Composite parent) {
        panel = new QaOverviewPanel(parent, SWT.NONE);
        IPreferenceStore prefs = new ScopedPreferenceStore(InstanceScope.INSTANCE, "org.tracegas.ui");
        DeskPreferences.setDefaults(prefs);
        if (Desk.get().project() != null) {
            panel.show(DemoProject.checks(Desk.get().project(), DeskPreferences.backgroundAgeLimit(prefs)));
        }
    }

    @Override
    public void setFocus() {
        panel.setFocus();
    }
}
