package org.tracegas.ui.session;

import java.util.HashMap;
import java.util.List;
import java.util.Map;

import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.OperationCanceledException;
import org.eclipse.core.runtime.SubMonitor;

import org.tracegas.method.MethodVersions;
import org.tracegas.library.io.FileFormatException;
import org.tracegas.model.AnalysisMethod;
import org.tracegas.model.Client;
import org.tracegas.model.Measurement;
import org.tracegas.model.Project;
import org.tracegas.model.ReferenceLibrary;
import org.tracegas.model.Workspace;
import org.tracegas.model.WorkspaceFactory;
import org.tracegas.store.ClientInfo;
import org.tracegas.store.MeasurementInfo;
import org.tracegas.store.ProjectInfo;
import org.tracegas.store.Session;
import org.tracegas.store.VersionInfo;
import org.tracegas.store.VersionKind;
import org.tracegas.store.WorkspaceStore;

/**
 * The navigator's model of a workspace that already held data when it was opened: the clients, projects and
 * measurements the signed-in user may read, and the newest version of each reference library and analysis
 * method (with its regions, as {@link MethodVersions} reads them for the workbench and the runner alike).
 */
public final class StoredWorkspace {

    private StoredWorkspace() {
    }

    /**
     * Reads the clients, projects and measurements visible to {@code actor}, and the libraries and methods.
     * Meant for a background job: it reports one step per project and stops between steps when cancelled.
     *
     * @throws org.eclipse.core.runtime.OperationCanceledException when the monitor was cancelled
     */
    public static Workspace load(WorkspaceStore store, Session actor, String name, IProgressMonitor monitor) {
        SubMonitor progress = SubMonitor.convert(monitor, "Reading the workspace " + name, 100);
        WorkspaceFactory f = WorkspaceFactory.eINSTANCE;
        Workspace w = f.createWorkspace();
        w.setName(name);
        Map<String, Client> clients = new HashMap<>();
        List<ClientInfo> clientInfos = store.projects().clients(actor);
        List<ProjectInfo> projectInfos = store.projects().projects(actor);
        progress.worked(5);
        for (ClientInfo info : clientInfos) {
            Client c = f.createClient();
            c.setId(info.id());
            c.setName(info.name());
            clients.put(info.id(), c);
            w.getClients().add(c);
        }
        SubMonitor perProject = progress.split(90).setWorkRemaining(Math.max(1, projectInfos.size()));
        for (ProjectInfo info : projectInfos) {
            perProject.subTask(info.code());
            SubMonitor step = perProject.split(1);
            Project p = f.createProject();
            p.setId(info.id());
            p.setCode(info.code());
            p.setName(info.name());
            for (MeasurementInfo mi : store.projects().measurements(actor, info.id())) {
                if (p.getMeasurements().size() % 500 == 0 && step.isCanceled()) {
                    throw new OperationCanceledException();
                }
                Measurement m = f.createMeasurement();
                m.setId(mi.id());
                m.setKind(mi.kind());
                m.setTime(mi.time());
                m.setCellTemperature(mi.cellTemperature());
                m.setCellPressure(mi.cellPressure());
                p.getMeasurements().add(m);
            }
            clients.get(info.clientId()).getProjects().add(p);
            step.done();
        }
        progress.split(5);
        for (VersionInfo v : store.versions().latest(VersionKind.LIBRARY)) {
            ReferenceLibrary l = f.createReferenceLibrary();
            l.setId(v.itemId());
            l.setName(v.name());
            w.getLibraries().add(l);
        }
        for (VersionInfo v : store.versions().latest(VersionKind.METHOD)) {
            w.getMethods().add(method(store, v));
        }
        return w;
    }

    /** The method with its regions; one whose stored text cannot be read is listed with the reason. */
    private static AnalysisMethod method(WorkspaceStore store, VersionInfo v) {
        try {
            return MethodVersions.read(store, v);
        } catch (FileFormatException e) {
            AnalysisMethod m = MethodVersions.model(v);
            m.setDescription("version " + v.number() + " cannot be read: " + e.getMessage());
            return m;
        }
    }
}
