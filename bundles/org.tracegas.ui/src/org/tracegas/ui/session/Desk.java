package org.tracegas.ui.session;

import java.util.List;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.function.Consumer;

import org.tracegas.model.edit.ModelEditor;
import org.tracegas.store.Session;
import org.tracegas.ui.jobs.BatchQuantificationJob;
import org.tracegas.ui.jobs.CampaignReportJob;

/**
 * What the desk's views share in one running workbench: the open workspace, the signed-in user, the model
 * being edited, the outcomes of the last method run and the last report made. Views register for new outcomes; notifications
 * arrive in the UI thread.
 */
public final class Desk {

    private static final Desk INSTANCE = new Desk();

    private final List<Consumer<List<BatchQuantificationJob.Outcome>>> runListeners = new CopyOnWriteArrayList<>();
    private final List<Runnable> storeListeners = new CopyOnWriteArrayList<>();
    private final List<Consumer<CampaignReportJob>> reportListeners = new CopyOnWriteArrayList<>();
    private volatile CampaignReportJob lastReport;
    private volatile WorkspaceAccess access;
    private volatile Session session;
    private volatile DemoProject.Seeded project;
    private volatile ModelEditor editor;
    private volatile List<BatchQuantificationJob.Outcome> lastRun = List.of();

    private Desk() {
    }

    public static Desk get() {
        return INSTANCE;
    }

    /**
     * @param project the seeded demo project, or null when the workspace was not fresh
     */
    public void start(WorkspaceAccess access, Session session, DemoProject.Seeded project) {
        this.access = access;
        this.session = session;
        this.project = project;
        this.editor = new ModelEditor();
        this.lastReport = null;
        if (project != null) {
            editor.createResource("desk:/workspace").getContents().add(project.model());
        }
    }

    public WorkspaceAccess access() {
        return access;
    }

    public Session session() {
        return session;
    }

    /** The project the desk knows in full (the demo), or null. */
    public DemoProject.Seeded project() {
        return project;
    }

    public ModelEditor editor() {
        return editor;
    }

    public List<BatchQuantificationJob.Outcome> lastRun() {
        return lastRun;
    }

    /** Called in the UI thread when a run finished. */
    public void runFinished(List<BatchQuantificationJob.Outcome> outcomes) {
        lastRun = List.copyOf(outcomes);
        if (project != null && !outcomes.isEmpty()) {
            // recording results froze the method version in the store; the tree shows it
            project.model().getMethods().forEach(m -> m.getVersions().forEach(v -> {
                if (project.methodVersionId().equals(v.getId())) {
                    v.setFrozen(true);
                }
            }));
        }
        runListeners.forEach(l -> l.accept(lastRun));
    }

    public void addRunListener(Consumer<List<BatchQuantificationJob.Outcome>> l) {
        runListeners.add(l);
    }

    public void removeRunListener(Consumer<List<BatchQuantificationJob.Outcome>> l) {
        runListeners.remove(l);
    }

    /**
     * Called in the UI thread when the desk stored measurements or results (an import, a method run), so that
     * the views read what they show again.
     */
    public void storeChanged() {
        storeListeners.forEach(Runnable::run);
    }

    public void addStoreListener(Runnable l) {
        storeListeners.add(l);
    }

    public void removeStoreListener(Runnable l) {
        storeListeners.remove(l);
    }

    /** The last report the desk wrote, or null. */
    public CampaignReportJob lastReport() {
        return lastReport;
    }

    /** Called in the UI thread when a report job wrote its report ({@link CampaignReportJob#outcome()} set). */
    public void reportMade(CampaignReportJob job) {
        lastReport = job;
        reportListeners.forEach(l -> l.accept(job));
    }

    public void addReportListener(Consumer<CampaignReportJob> l) {
        reportListeners.add(l);
    }

    public void removeReportListener(Consumer<CampaignReportJob> l) {
        reportListeners.remove(l);
    }
}
