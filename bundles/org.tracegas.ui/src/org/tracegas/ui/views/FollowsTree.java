package org.tracegas.ui.views;

import org.eclipse.jface.viewers.ISelection;
import org.eclipse.ui.IWorkbenchPart;

/** A view that shows what is selected in the workspace tree (and can be handed a selection when it opens). */
interface FollowsTree {

    /** Shows what {@code selection} stands for, if it is anything this view shows. */
    void selected(IWorkbenchPart part, ISelection selection);
}
