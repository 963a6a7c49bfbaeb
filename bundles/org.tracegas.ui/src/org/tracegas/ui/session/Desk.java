package org.tracegas.ui.session;

import java.util.List;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.function.Consumer;

import org.tracegas.model.edit.ModelEditor;
import org.tracegas.store.Session;
import org.tracegas.ui.jobs.CampaignReportJob;

/**
 * What the desk's views share in one running workbench: the open workspace, the signed-in user, the model
 * being edited and the last report made. Views register for changes of the store and for new reports;
 * notifications arrive in the UI thread.
 */
public final class Desk {

    private static final Desk INSTANCE = new Desk();

    private final List<Runnable> storeListeners = new CopyOnWriteArrayList<>();
    private final List<Consumer<CampaignReportJob>> reportListeners = new CopyOnWriteArrayList<>();
    private volatile CampaignReportJob lastReport;
    private volatile WorkspaceAccess access;
    private volatile Session session;
    private volatile ModelEditor editor;

    private Desk() {
    }

    public static Desk get() {
        return INSTANCE;
    }

    public void start(WorkspaceAccess access, Session session) {
        this.access = access;
        this.session = session;
        this.editor = new ModelEditor();
        this.lastReport = null;
    }

    public WorkspaceAccess access() {
        return access;
    }

    public Session session() {
        return session;
    }

    public ModelEditor editor() {
        return editor;
    }

    /**
     * Called in the UI thread when the desk stored measurements, results or method versions (an import, a method
     * run, a saved method version), so that the views read what they show again.
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
