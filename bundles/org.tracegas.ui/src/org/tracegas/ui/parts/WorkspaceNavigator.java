package org.tracegas.ui.parts;

import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Map;

import org.eclipse.jface.viewers.IStructuredSelection;
import org.eclipse.jface.viewers.ITreeContentProvider;
import org.eclipse.jface.viewers.ITreeViewerListener;
import org.eclipse.jface.viewers.LabelProvider;
import org.eclipse.jface.viewers.StructuredSelection;
import org.eclipse.jface.viewers.TreeExpansionEvent;
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
 * the analysis methods with their versions. A project's measurements are listed a page at a time; the node
 * after the last page shown brings the next page when it is expanded or double-clicked. While the workspace
 * is read, the tree holds a single note saying so.
 */
public final class WorkspaceNavigator extends Composite {

    /** A heading node grouping libraries or methods. */
    public record Group(String label, List<?> members) {
    }

    /** Stands for the measurements of a project beyond those shown; expanding it shows the next page. */
    public record More(Project project, int hidden) {
    }

    /** A line of text instead of a workspace, e.g. while it is read or when reading failed. */
    public record Note(String text) {
    }

    /** Measurements listed per page under a project; a day of one-minute measurements would swamp the tree. */
    public static final int PAGE = 500;

    private static final DateTimeFormatter TIME = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm:ss 'UTC'")
            .withZone(ZoneOffset.UTC);

    private final TreeViewer viewer;
    /** Measurements shown per project, in pages; identity keys, as projects of two reads may be equal. */
    private final Map<Project, Integer> shown = new IdentityHashMap<>();

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
        viewer.setUseHashlookup(true);
        viewer.addTreeListener(new ITreeViewerListener() {
            @Override
            public void treeExpanded(TreeExpansionEvent e) {
                if (e.getElement() instanceof More m) {
                    // the tree is still expanding the node; change its parent's children afterwards
                    getDisplay().asyncExec(() -> {
                        if (!isDisposed()) {
                            showMore(m.project());
                        }
                    });
                }
            }

            @Override
            public void treeCollapsed(TreeExpansionEvent e) {
                // nothing to do: pages shown stay shown
            }
        });
        viewer.addDoubleClickListener(e -> {
            if (((IStructuredSelection) e.getSelection()).getFirstElement() instanceof More m) {
                showMore(m.project());
            }
        });
    }

    public void setWorkspace(Workspace workspace) {
        shown.clear();
        viewer.setInput(workspace);
        viewer.expandToLevel(2);
    }

    /** Shows a note instead of a workspace, e.g. "Reading the workspace …". */
    public void showNote(String text) {
        shown.clear();
        viewer.setInput(new Note(text));
    }

    /** The workspace shown, or null while a note is shown. */
    public Workspace workspace() {
        return viewer.getInput() instanceof Workspace w ? w : null;
    }

    public TreeViewer viewer() {
        return viewer;
    }

    /** How many of the project's measurements are listed. */
    public int shownMeasurements(Project p) {
        return Math.min(p.getMeasurements().size(), shown.getOrDefault(p, PAGE));
    }

    /** Lists the next page of the project's measurements and selects the first of them. */
    public void showMore(Project p) {
        int before = shownMeasurements(p);
        if (before >= p.getMeasurements().size()) {
            return;
        }
        shown.put(p, before + PAGE);
        viewer.refresh(p);
        viewer.setSelection(new StructuredSelection(p.getMeasurements().get(before)), true);
    }

    /** Selects and reveals a project by its code; returns false if there is none. */
    public boolean openProject(String code) {
        Workspace w = workspace();
        if (w == null) {
            return false;
        }
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
            return "… " + m.hidden() + " more measurements (expand for the next " + Math.min(PAGE, m.hidden()) + ")";
        } else if (e instanceof Note n) {
            return n.text();
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

    private final class Content implements ITreeContentProvider {
        @Override
        public Object[] getElements(Object input) {
            if (input instanceof Note n) {
                return new Object[] {n};
            }
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
            } else if (e instanceof More) {
                // shown for the moment the node opens, until the next page replaces it
                return new Object[] {new Note("listing the next measurements …")};
            }
            return new Object[0];
        }

        private Object[] measurements(Project p) {
            List<?> all = p.getMeasurements();
            int n = shownMeasurements(p);
            List<Object> page = new ArrayList<>(all.subList(0, n));
            if (n < all.size()) {
                page.add(new More(p, all.size() - n));
            }
            return page.toArray();
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
            if (e instanceof Project p) {
                return !p.getMeasurements().isEmpty();
            }
            return e instanceof More || getChildren(e).length > 0;
        }
    }
}
