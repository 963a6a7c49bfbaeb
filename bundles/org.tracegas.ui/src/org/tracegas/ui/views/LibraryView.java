package org.tracegas.ui.views;

import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.ui.part.ViewPart;
import org.tracegas.ui.parts.LibraryBrowserPanel;
import org.tracegas.ui.session.Desk;

/** The reference spectra of the workspace's library in {@link LibraryBrowserPanel}. */
public final class LibraryView extends ViewPart {

    public static final String ID = "org.tracegas.ui.views.library";

    private LibraryBrowserPanel panel;

    @Override
    public void createPartControl(Composite parent) {
        panel = new LibraryBrowserPanel(parent, SWT.NONE);
        Desk desk = Desk.get();
        if (desk.project() != null) {
            panel.show(desk.project().model().getLibraries().get(0).getName(), desk.project().library());
        }
    }

    @Override
    public void setFocus() {
        panel.setFocus();
    }
}
