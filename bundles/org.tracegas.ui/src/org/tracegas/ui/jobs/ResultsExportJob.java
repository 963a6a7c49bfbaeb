package org.tracegas.ui.jobs;

import java.io.IOException;
import java.nio.file.Path;

import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.IStatus;
import org.eclipse.core.runtime.Status;
import org.eclipse.core.runtime.jobs.Job;
import org.tracegas.report.campaign.ResultsExport;
import org.tracegas.store.ProjectInfo;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;

/**
 * Writes a project's stored results as CSV in the background through the same code as the runner's
 * {@code results-export} ({@link ResultsExport}): the file whole or not at all, the export recorded in the audit
 * trail with the file's SHA-256.
 */
public final class ResultsExportJob extends Job {

    private final WorkspaceStore store;
    private final Session actor;
    private final ProjectInfo project;
    private final Path out;

    public ResultsExportJob(WorkspaceStore store, Session actor, ProjectInfo project, Path out) {
        super("Exporting the results of " + project.code() + " to " + out.getFileName());
        this.store = store;
        this.actor = actor;
        this.project = project;
        this.out = out;
        setUser(true);
    }

    @Override
    protected IStatus run(IProgressMonitor monitor) {
        monitor.beginTask(getName(), IProgressMonitor.UNKNOWN);
        try {
            ResultsExport.Written w = ResultsExport.write(store, actor, project.id(), out);
            // the values are of toxic gases: they are not to be used without their uncertainty and flags
            return Status.info("Wrote " + w.results() + " result(s) of project " + project.code() + " to " + out
                    + " (sha256 " + w.sha256() + ", recorded in the audit trail). Caution: results of toxic gases;"
                    + " read each value with its uncertainty, detection limit and flags.");
        } catch (IOException | RuntimeException e) {
            return Status.error("the results of " + project.code() + " could not be written to " + out + ": "
                    + e.getMessage() + "; nothing exported", e);
        } finally {
            monitor.done();
        }
    }
}
