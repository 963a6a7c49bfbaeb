package org.tracegas.ui.internal;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;

import org.eclipse.jface.viewers.ISelection;
import org.eclipse.jface.viewers.IStructuredSelection;
import org.tracegas.model.Measurement;
import org.tracegas.model.Project;

/** What the desk's commands take from the workspace tree's selection: a project, and chosen measurements. */
public final class TreeChoice {

    private TreeChoice() {
    }

    /** The stored project of the first selected project or measurement, or null. */
    public static Project project(ISelection selection, List<Project> projects) {
        String id = null;
        for (Object o : elements(selection)) {
            Project p = project(o);
            if (p != null) {
                id = p.getId();
                break;
            }
        }
        for (Project info : projects) {
            if (info.getId().equals(id)) {
                return info;
            }
        }
        return null;
    }

    /**
     * The ids of the selected measurements of {@code project}, in the order selected; a selected project stands
     * for all its measurements.
     */
    public static List<String> measurementIds(ISelection selection, Project project) {
        Set<String> ids = new LinkedHashSet<>();
        for (Object o : elements(selection)) {
            Project p = project(o);
            if (p == null || !p.getId().equals(project.getId())) {
                continue;
            }
            if (o instanceof Measurement m) {
                ids.add(m.getId());
            } else {
                p.getMeasurements().forEach(m -> ids.add(m.getId()));
            }
        }
        return new ArrayList<>(ids);
    }

    private static Project project(Object o) {
        if (o instanceof Measurement m && m.eContainer() instanceof Project p) {
            return p;
        }
        return o instanceof Project p ? p : null;
    }

    private static List<?> elements(ISelection selection) {
        return selection instanceof IStructuredSelection s ? s.toList() : List.of();
    }
}
