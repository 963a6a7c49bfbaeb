package org.tracegas.ui.parts;

import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.List;

import org.eclipse.jface.viewers.ITreeContentProvider;
import org.eclipse.jface.viewers.LabelProvider;
import org.eclipse.jface.viewers.StructuredSelection;
import org.eclipse.jface.viewers.TreeViewer;
import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.FillLayout;
import org.eclipse.swt.widgets.Composite;
import org.tracegas.model.AnalysisMethod;
import org.tracegas.model.Client;
import org.tracegas.model.Measurement;
import org.tracegas.model.MethodVersion;
import org.tracegas.model.Project;
import org.tracegas.model.ReferenceLibrary;
import org.tracegas.model.Workspace;

/**
 * The workspace as a tree: clients with their projects and measurements, then the reference libraries and
 * the analysis methods with their versions.
 */
public final class WorkspaceNavigator extends Composite {

    /** A heading node grouping libraries or methods. */
    public record Group(String label, List<?> members) {
    }

    /** Stands for the measurements of a project beyond the first {@link #SHOWN_MEASUREMENTS}. */
    public record More(Project project, int hidden) {
    }

    /** Measurements listed under a project; a day of one-minute measurements would swamp the tree. */
    public static final int SHOWN_MEASUREMENTS = 200;

    private static final DateTimeFormatter TIME = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm:ss 'UTC'")
            .withZone(ZoneOffset.UTC);

    private final TreeViewer viewer;

    public WorkspaceNavigator(Composite parent, int style) {
        super(parent, style);
        setLayout(new FillLayout());
        viewer = new TreeViewer(this, SWT.SINGLE | SWT.V_SCROLL | SWT.H_SCROLL);
        viewer.setContentProvider(new Content());
        viewer.setLabelProvider(new LabelProvider() {
            @Override
            public String getText(Object element) {
                return label(element);
            }
        });
    }

    public void setWorkspace(Workspace workspace) {
        viewer.setInput(workspace);
        viewer.expandToLevel(2);
    }

    public TreeViewer viewer() {
        return viewer;
    }

    /** Selects and reveals a project by its code; returns false if there is none. */
    public boolean openProject(String code) {
        Workspace w = (Workspace) viewer.getInput();
        for (Client c : w.getClients()) {
            for (Project p : c.getProjects()) {
                if (code.equals(p.getCode())) {
                    viewer.expandToLevel(p, 1);
                    viewer.setSelection(new StructuredSelection(p), true);
                    return true;
                }
            }
        }
        return false;
    }

    /** The text shown for a tree element. */
    static String label(Object e) {
        if (e instanceof Client c) {
            return c.getName();
        } else if (e instanceof Project p) {
            return p.getCode() + "  " + p.getName() + "  (" + p.getMeasurements().size() + " measurements)";
        } else if (e instanceof Measurement m) {
            return m.getKind().getLiteral().toLowerCase().replace('_', ' ') + "  "
                    + (m.getTime() == null ? "time unknown" : TIME.format(m.getTime()));
        } else if (e instanceof More m) {
            return "… " + m.hidden() + " more measurements";
        } else if (e instanceof Group g) {
            return g.label();
        } else if (e instanceof ReferenceLibrary l) {
            return l.getName() + (l.getDescription() == null ? "" : "  — " + l.getDescription());
        } else if (e instanceof AnalysisMethod m) {
            return m.getName();
        } else if (e instanceof MethodVersion v) {
            return "version " + v.getNumber() + (v.isFrozen() ? " (frozen)" : " (draft)");
        }
        return String.valueOf(e);
    }

    private static final class Content implements ITreeContentProvider {
        @Override
        public Object[] getElements(Object input) {
            Workspace w = (Workspace) input;
            List<Object> top = new ArrayList<>(w.getClients());
            top.add(new Group("Reference libraries", w.getLibraries()));
            top.add(new Group("Analysis methods", w.getMethods()));
            return top.toArray();
        }

        @Override
        public Object[] getChildren(Object e) {
            if (e instanceof Client c) {
                return c.getProjects().toArray();
            } else if (e instanceof Project p) {
                return measurements(p);
            } else if (e instanceof Group g) {
                return g.members().toArray();
            } else if (e instanceof AnalysisMethod m) {
                return m.getVersions().toArray();
            }
            return new Object[0];
        }

        private static Object[] measurements(Project p) {
            List<?> all = p.getMeasurements();
            if (all.size() <= SHOWN_MEASUREMENTS) {
                return all.toArray();
            }
            List<Object> shown = new ArrayList<>(all.subList(0, SHOWN_MEASUREMENTS));
            shown.add(new More(p, all.size() - SHOWN_MEASUREMENTS));
            return shown.toArray();
        }

        @Override
        public Object getParent(Object e) {
            if (e instanceof More m) {
                return m.project();
            }
            return e instanceof org.eclipse.emf.ecore.EObject o ? o.eContainer() : null;
        }

        @Override
        public boolean hasChildren(Object e) {
            return getChildren(e).length > 0;
        }
    }
}
