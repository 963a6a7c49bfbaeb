package org.tracegas.ui.views;

import org.eclipse.jface.viewers.ISelection;
import org.eclipse.jface.viewers.IStructuredSelection;
import org.tracegas.model.Measurement;
import org.tracegas.model.Project;

/** What a selection in the workspace tree stands for, as the views that follow it need it. */
final class Selections {

    private Selections() {
    }

    /** The selected project, or the project of the selected measurement; null for anything else. */
    static Project project(ISelection selection) {
        Object o = first(selection);
        if (o instanceof Measurement m && m.eContainer() instanceof Project p) {
            return p;
        }
        return o instanceof Project p ? p : null;
    }

    /** The selected measurement, or null. */
    static Measurement measurement(ISelection selection) {
        return first(selection) instanceof Measurement m ? m : null;
    }

    private static Object first(ISelection selection) {
        return selection instanceof IStructuredSelection s ? s.getFirstElement() : null;
    }
}
