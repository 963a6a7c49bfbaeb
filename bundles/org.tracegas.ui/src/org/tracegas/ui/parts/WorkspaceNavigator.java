package org.tracegas.ui.parts;

import java.time.LocalDate;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;
import java.util.function.Consumer;
import java.util.function.Predicate;

import org.eclipse.jface.action.Action;
import org.eclipse.jface.action.MenuManager;
import org.eclipse.jface.viewers.IStructuredSelection;
import org.eclipse.jface.viewers.ITreeContentProvider;
import org.eclipse.jface.viewers.ITreeViewerListener;
import org.eclipse.jface.viewers.StructuredSelection;
import org.eclipse.jface.viewers.TreeExpansionEvent;
import org.eclipse.jface.viewers.TreeViewer;
import org.eclipse.jface.viewers.Viewer;
import org.eclipse.jface.viewers.ViewerFilter;
import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Text;
import org.eclipse.emf.common.notify.AdapterFactory;
import org.tracegas.model.Client;
import org.tracegas.model.EmissionSource;
import org.tracegas.model.Measurement;
import org.tracegas.model.MeasurementKind;
import org.tracegas.model.Project;
import org.tracegas.model.Site;
import org.tracegas.model.Workspace;
import org.tracegas.model.provider.WorkbenchItemProviderAdapterFactory;
import org.tracegas.ui.items.ItemLabels;
import org.tracegas.ui.items.ItemTreeContent;

/**
 * The workspace as a tree: clients with their projects, each project's measurements grouped by day (UTC) and
 * kind followed by its work batches and the reports issued from it, then the reference libraries and the analysis methods with their versions and regions. The model
 * objects' labels, icons and children are their item providers' (the workspace model's generated edit code, as
 * the properties view shows the objects too); the headings, days, kinds and pages are this tree's own nodes. A
 * group's measurements are listed a page at a time; the node after the last page shown brings the next page when it is expanded or
 * double-clicked. A filter box above the tree keeps what matches its text; the context menu offers what the
 * desk registered for the element. While the workspace is read, the tree holds a single note saying so.
 */
public final class WorkspaceNavigator extends Composite {

    /** A heading node grouping libraries or methods. */
    public record Group(String label, List<?> members) {
    }

    /** A project's measurements of one calendar day (UTC). */
    public record Day(Project project, LocalDate day) {
    }

    /** A day's measurements of one kind (samples, backgrounds, ...), listed a page at a time. */
    public record KindGroup(Day day, MeasurementKind kind) {
    }

    /** Stands for the measurements of a group beyond those shown; expanding it shows the next page. */
    public record More(KindGroup group, int hidden) {
    }

    /** An entry of the tree's context menu, offered for the elements it applies to. */
    public record MenuAction(String label, Predicate<Object> appliesTo, Consumer<Object> run) {
    }

    /** A line of text instead of a workspace, e.g. while it is read or when reading failed. */
    public record Note(String text) {
    }

    /** Measurements listed per page under a project; a day of one-minute measurements would swamp the tree. */
    public static final int PAGE = 500;

    private final WorkbenchItemProviderAdapterFactory adapters = new WorkbenchItemProviderAdapterFactory();
    private final Labels labels = new Labels();
    private final Text filter;
    private final TreeViewer viewer;
    /** Measurements shown per group, in pages. */
    private final Map<KindGroup, Integer> shown = new HashMap<>();
    /** Each project's measurements by day and kind, in time order; identity keys (projects of two reads may be equal). */
    private final Map<Project, Map<LocalDate, Map<MeasurementKind, List<Measurement>>>> grouped =
            new IdentityHashMap<>();
    private final List<MenuAction> menuActions = new ArrayList<>();

    public WorkspaceNavigator(Composite parent, int style) {
        super(parent, style);
        GridLayout layout = new GridLayout(1, false);
        layout.marginWidth = 0;
        layout.marginHeight = 0;
        setLayout(layout);
        filter = new Text(this, SWT.SEARCH | SWT.ICON_CANCEL | SWT.ICON_SEARCH);
        filter.setMessage("Filter: project, client, plant, source, kind or day (e.g. 2026-07-14)");
        filter.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
        viewer = new TreeViewer(this, SWT.MULTI | SWT.V_SCROLL | SWT.H_SCROLL);
        viewer.getTree().setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
        viewer.addFilter(new ViewerFilter() {
            @Override
            public boolean select(Viewer v, Object parentElement, Object element) {
                return matches(element, filter.getText().strip().toLowerCase(Locale.ROOT));
            }
        });
        filter.addListener(SWT.Modify, e -> viewer.refresh());
        MenuManager menu = new MenuManager();
        menu.setRemoveAllWhenShown(true);
        menu.addMenuListener(m -> {
            Object o = ((IStructuredSelection) viewer.getSelection()).getFirstElement();
            for (MenuAction a : actionsFor(o)) {
                m.add(new Action(a.label()) {
                    @Override
                    public void run() {
                        a.run().accept(o);
                    }
                });
            }
        });
        viewer.getTree().setMenu(menu.createContextMenu(viewer.getTree()));
        addDisposeListener(e -> {
            menu.dispose();
            adapters.dispose();
        });
        viewer.setContentProvider(new Content());
        viewer.setLabelProvider(labels);
        viewer.setUseHashlookup(true);
        viewer.addTreeListener(new ITreeViewerListener() {
            @Override
            public void treeExpanded(TreeExpansionEvent e) {
                if (e.getElement() instanceof More m) {
                    // the tree is still expanding the node; change its parent's children afterwards
                    getDisplay().asyncExec(() -> {
                        if (!isDisposed()) {
                            showMore(m.group());
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
                showMore(m.group());
            }
        });
    }

    public void setWorkspace(Workspace workspace) {
        shown.clear();
        grouped.clear();
        viewer.setInput(workspace);
        viewer.expandToLevel(2);
    }

    /** Shows a note instead of a workspace, e.g. "Reading the workspace …". */
    public void showNote(String text) {
        shown.clear();
        grouped.clear();
        viewer.setInput(new Note(text));
    }

    /** The workspace shown, or null while a note is shown. */
    public Workspace workspace() {
        return viewer.getInput() instanceof Workspace w ? w : null;
    }

    public TreeViewer viewer() {
        return viewer;
    }

    /** The item providers the tree shows the model objects through, for views that show them the same way. */
    public AdapterFactory adapters() {
        return adapters;
    }

    /** The filter box above the tree. */
    public Text filter() {
        return filter;
    }

    /** Offers an entry in the tree's context menu for the elements it applies to. */
    public void addMenuAction(MenuAction action) {
        menuActions.add(action);
    }

    /** The context-menu entries offered for an element. */
    public List<MenuAction> actionsFor(Object element) {
        return menuActions.stream().filter(a -> element != null && a.appliesTo().test(element)).toList();
    }

    /** The groups of a project: its days, in time order. */
    public List<Day> days(Project p) {
        return byDay(p).keySet().stream().map(d -> new Day(p, d)).toList();
    }

    /** The measurements of a group, in time order. */
    public List<Measurement> measurements(KindGroup g) {
        return byDay(g.day().project()).getOrDefault(g.day().day(), Map.of()).getOrDefault(g.kind(), List.of());
    }

    /** How many of the group's measurements are listed. */
    public int shownMeasurements(KindGroup g) {
        return Math.min(measurements(g).size(), shown.getOrDefault(g, PAGE));
    }

    /** Lists the next page of the group's measurements and selects the first of them. */
    public void showMore(KindGroup g) {
        int before = shownMeasurements(g);
        List<Measurement> all = measurements(g);
        if (before >= all.size()) {
            return;
        }
        shown.put(g, before + PAGE);
        viewer.refresh(g);
        viewer.setSelection(new StructuredSelection(all.get(before)), true);
    }

    private Map<LocalDate, Map<MeasurementKind, List<Measurement>>> byDay(Project p) {
        return grouped.computeIfAbsent(p, k -> {
            Map<LocalDate, Map<MeasurementKind, List<Measurement>>> days = new TreeMap<>();
            List<Measurement> sorted = new ArrayList<>(p.getMeasurements());
            sorted.sort(Comparator.comparing(Measurement::getTime, Comparator.nullsLast(Comparator.naturalOrder())));
            for (Measurement m : sorted) {
                LocalDate day = m.getTime() == null ? LocalDate.MIN : LocalDate.ofInstant(m.getTime(), ZoneOffset.UTC);
                days.computeIfAbsent(day, d -> new TreeMap<>()).computeIfAbsent(m.getKind(), x -> new ArrayList<>())
                        .add(m);
            }
            return days;
        });
    }

    /** Whether an element, or something beneath it, matches the filter text (lower case; empty matches all). */
    private boolean matches(Object e, String text) {
        if (text.isEmpty() || !(e instanceof Client || e instanceof Site || e instanceof EmissionSource
                || e instanceof Project || e instanceof Day || e instanceof KindGroup || e instanceof Measurement)) {
            return true;
        }
        if (label(e).toLowerCase(Locale.ROOT).contains(text)) {
            return true;
        }
        if (e instanceof Client c) {
            return c.getProjects().stream().anyMatch(p -> matches(p, text))
                    || c.getSites().stream().anyMatch(s -> matches(s, text));
        } else if (e instanceof Site s) {
            return s.getSources().stream().anyMatch(source -> matches(source, text));
        } else if (e instanceof EmissionSource source) {
            // a source matches through its site too, so the plant's name keeps its sources
            return source.eContainer() instanceof Site s && label(s).toLowerCase(Locale.ROOT).contains(text);
        } else if (e instanceof Project p) {
            // a project matches by the plant and emission source it measures, so "Tarnbeck" keeps its projects
            return measures(p, text) || days(p).stream().anyMatch(d -> matches(d, text));
        } else if (e instanceof Day d) {
            return byDay(d.project()).get(d.day()).keySet().stream().anyMatch(k -> matches(new KindGroup(d, k), text));
        } else if (e instanceof KindGroup g) {
            return measurements(g).stream().anyMatch(m -> matches(m, text));
        } else if (e instanceof Measurement m) {
            // a measurement matches through its project, day or kind too, so "2026-07-14" keeps that day's
            return m.eContainer() instanceof Project p && (label(p).toLowerCase(Locale.ROOT).contains(text)
                    || measures(p, text));
        }
        return false;
    }

    /** Whether the emission source a project measures, or its site, is labelled with the filter text. */
    private boolean measures(Project p, String text) {
        EmissionSource source = p.getSource();
        return source != null && (label(source).toLowerCase(Locale.ROOT).contains(text)
                || source.eContainer() instanceof Site s && label(s).toLowerCase(Locale.ROOT).contains(text));
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
    private String label(Object e) {
        return labels.getText(e);
    }

    /** The tree's own nodes' labels; a model object's are its item provider's. */
    private final class Labels extends ItemLabels {
        Labels() {
            super(adapters);
        }

        @Override
        public String getText(Object e) {
            if (e instanceof Day d) {
                return d.day().equals(LocalDate.MIN) ? "time unknown" : d.day().toString();
            } else if (e instanceof KindGroup g) {
                return WorkbenchItemProviderAdapterFactory.kind(g.kind());
            } else if (e instanceof More m) {
                return "… " + m.hidden() + " more measurements (expand for the next " + Math.min(PAGE, m.hidden())
                        + ")";
            } else if (e instanceof Note n) {
                return n.text();
            } else if (e instanceof Group g) {
                return g.label();
            }
            return super.getText(e);
        }
    }

    /**
     * The model objects' children as their item providers give them, except a project's measurements, which the
     * tree groups by day and kind and lists a page at a time (its work batches and reports follow them).
     */
    private final class Content implements ITreeContentProvider {
        private final ItemTreeContent items = new ItemTreeContent(adapters);

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
            if (e instanceof Project p) {
                List<Object> children = new ArrayList<>(days(p));
                children.addAll(p.getBatches());
                children.addAll(p.getReports());
                return children.toArray();
            } else if (e instanceof Day d) {
                return byDay(d.project()).get(d.day()).keySet().stream().map(k -> new KindGroup(d, k)).toArray();
            } else if (e instanceof KindGroup g) {
                return page(g);
            } else if (e instanceof Group g) {
                return g.members().toArray();
            } else if (e instanceof More) {
                // shown for the moment the node opens, until the next page replaces it
                return new Object[] {new Note("listing the next measurements …")};
            }
            return items.getChildren(e);
        }

        private Object[] page(KindGroup g) {
            List<Measurement> all = measurements(g);
            int n = shownMeasurements(g);
            List<Object> page = new ArrayList<>(all.subList(0, n));
            if (n < all.size()) {
                page.add(new More(g, all.size() - n));
            }
            return page.toArray();
        }

        @Override
        public Object getParent(Object e) {
            if (e instanceof More m) {
                return m.group();
            } else if (e instanceof KindGroup g) {
                return g.day();
            } else if (e instanceof Day d) {
                return d.project();
            } else if (e instanceof Measurement m && m.eContainer() instanceof Project p && m.getTime() != null) {
                return new KindGroup(new Day(p, LocalDate.ofInstant(m.getTime(), ZoneOffset.UTC)), m.getKind());
            }
            return items.getParent(e);
        }

        @Override
        public boolean hasChildren(Object e) {
            if (e instanceof Project p) {
                return !p.getMeasurements().isEmpty() || !p.getBatches().isEmpty() || !p.getReports().isEmpty();
            } else if (e instanceof Day || e instanceof KindGroup || e instanceof Group || e instanceof Note) {
                return getChildren(e).length > 0;
            }
            return e instanceof More || items.hasChildren(e);
        }
    }
}
