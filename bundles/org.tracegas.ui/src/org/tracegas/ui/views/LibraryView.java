package org.tracegas.ui.views;

import java.util.List;

import org.eclipse.jface.viewers.ISelection;
import org.eclipse.jface.viewers.IStructuredSelection;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.ui.ISelectionListener;
import org.eclipse.ui.IWorkbenchPart;
import org.eclipse.ui.part.ViewPart;
import org.tracegas.model.ReferenceLibrary;
import org.tracegas.ui.jobs.LatestLoad;
import org.tracegas.ui.parts.LibraryBrowserPanel;
import org.tracegas.ui.session.Desk;
import org.tracegas.ui.session.StoredLibrary;

/**
 * The references of a library in {@link LibraryBrowserPanel}: at first the demo's spectra, then those the newest
 * stored version lists of the library selected in the navigator, read in the background.
 */
public final class LibraryView extends ViewPart implements FollowsTree {

    public static final String ID = "org.tracegas.ui.views.library";

    private LibraryBrowserPanel panel;
    private LatestLoad<StoredLibrary.Listing> loads;
    private final ISelectionListener libraryListener = this::selected;

    @Override
    public void createPartControl(Composite parent) {
        createContent(parent);
        getSite().getPage().addSelectionListener(NavigatorView.ID, libraryListener);
    }

    /** The panel and its feed, without the workbench site (so that it can be shown in any shell). */
    LibraryBrowserPanel createContent(Composite parent) {
        panel = new LibraryBrowserPanel(parent, SWT.NONE);
        loads = new LatestLoad<>(panel);
        panel.showRows("Select a reference library in the workspace tree to list its references.", List.of());
        return panel;
    }

    /** Reads the selected library's newest stored version in the background; a later selection wins. */
    @Override
    public void selected(IWorkbenchPart part, ISelection selection) {
        if (panel.isDisposed() || !(selection instanceof IStructuredSelection s)
                || !(s.getFirstElement() instanceof ReferenceLibrary library) || library.getName() == null) {
            return;
        }
        String name = library.getName();
        Desk desk = Desk.get();
        panel.showRows("Reading the library " + name + " …", List.of());
        loads.start("Reading the library " + name, monitor -> StoredLibrary.latest(desk.access().store(), name),
                listing -> panel.showRows(name + ", version " + listing.version().getNumber() + ": "
                        + listing.references().size() + " references" + (listing.note().isEmpty() ? ""
                                : "; " + listing.note()), listing.rows()),
                message -> panel.showRows("The library " + name + " could not be read: " + message, List.of()));
    }

    /** The panel shown. */
    public LibraryBrowserPanel panel() {
        return panel;
    }

    @Override
    public void dispose() {
        getSite().getPage().removeSelectionListener(NavigatorView.ID, libraryListener);
        loads.cancel();
        super.dispose();
    }

    @Override
    public void setFocus() {
        panel.setFocus();
    }
}
