package org.tracegas.ui.session;

import java.util.List;

import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.OperationCanceledException;
import org.eclipse.core.runtime.SubMonitor;

import org.tracegas.library.io.FileFormatException;
import org.tracegas.method.MethodVersions;
import org.tracegas.model.AnalysisMethod;
import org.tracegas.model.Client;
import org.tracegas.model.ContentVersion;
import org.tracegas.model.Measurement;
import org.tracegas.model.Project;
import org.tracegas.model.ReferenceLibrary;
import org.tracegas.model.VersionKind;
import org.tracegas.model.Workspace;
import org.tracegas.model.WorkspaceFactory;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;

/**
 * The navigator's model of a workspace that already held data when it was opened: the clients, projects,
 * measurements and work batches the signed-in user may read, as the store reads them, and the newest version of each reference
 * library (with its references, as {@link StoredLibrary} reads them) and analysis method (with its regions, as {@link MethodVersions} reads them for the workbench and the
 * runner alike).
 */
public final class StoredWorkspace {

    private StoredWorkspace() {
    }

    /**
     * Reads the clients, projects, measurements, work batches and issued reports visible to {@code actor}, and
     * the libraries and methods.
     * Meant for a background job: it reports one step per project and stops between steps when cancelled.
     *
     * @throws org.eclipse.core.runtime.OperationCanceledException when the monitor was cancelled
     */
    public static Workspace load(WorkspaceStore store, Session actor, String name, IProgressMonitor monitor) {
        SubMonitor progress = SubMonitor.convert(monitor, "Reading the workspace " + name, 100);
        WorkspaceFactory f = WorkspaceFactory.eINSTANCE;
        Workspace w = f.createWorkspace();
        w.setName(name);
        List<Client> clients = store.projects().clients(actor);
        w.getClients().addAll(clients);
        List<Project> projects = clients.stream().flatMap(c -> c.getProjects().stream()).toList();
        progress.worked(5);
        SubMonitor perProject = progress.split(90).setWorkRemaining(Math.max(1, projects.size()));
        for (Project p : projects) {
            perProject.subTask(p.getCode());
            SubMonitor step = perProject.split(1);
            List<Measurement> measurements = store.projects().measurements(actor, p.getId());
            if (!measurements.isEmpty()) {
                // out of the project they were read in, in one pass: moving them one by one would search
                // and shift that project's list for each
                measurements.get(0).getProject().getMeasurements().clear();
            }
            for (Measurement m : measurements) {
                if (p.getMeasurements().size() % 500 == 0 && step.isCanceled()) {
                    throw new OperationCanceledException();
                }
                p.getMeasurements().add(m);
            }
            // a handful per project, read by one indexed query
            p.getBatches().addAll(store.workUnits().batches(actor, p.getId()));
            p.getReports().addAll(store.reports().reports(actor, p.getId()));
            step.done();
        }
        progress.split(5);
        for (ContentVersion v : store.versions().latest(VersionKind.LIBRARY)) {
            ReferenceLibrary l = f.createReferenceLibrary();
            l.setId(v.getItemId());
            l.setName(v.getItemName());
            l.getReferences().addAll(StoredLibrary.of(v, store.versions().content(v.getId())).references());
            w.getLibraries().add(l);
        }
        for (ContentVersion v : store.versions().latest(VersionKind.METHOD)) {
            w.getMethods().add(method(store, v));
        }
        return w;
    }

    /** The method with its regions; one whose stored text cannot be read is listed with the reason. */
    private static AnalysisMethod method(WorkspaceStore store, ContentVersion v) {
        try {
            return MethodVersions.read(store, v);
        } catch (FileFormatException e) {
            AnalysisMethod m = MethodVersions.model(v);
            m.setDescription("version " + v.getNumber() + " cannot be read: " + e.getMessage());
            return m;
        }
    }
}
