package org.tracegas.ui.jobs;

import java.sql.Connection;
import java.sql.SQLException;
import java.util.function.Consumer;

import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.IStatus;
import org.eclipse.core.runtime.Status;
import org.eclipse.core.runtime.jobs.Job;
import org.tracegas.audit.AuditReview;
import org.tracegas.audit.AuditQuery;
import org.tracegas.ui.session.WorkspaceAccess;

/**
 * Reads the audit records matching a filter and verifies the whole hash chain in one snapshot, in the
 * background. The chain walk itself cannot be interrupted; cancelling before it starts skips it.
 */
public final class ChainVerificationJob extends Job {

    private final WorkspaceAccess access;
    private final AuditQuery query;
    private final Consumer<AuditReview.Result> whenDone;

    /** @param whenDone receives the result in the job's thread (pass on with Display.asyncExec) */
    public ChainVerificationJob(WorkspaceAccess access, AuditQuery query, Consumer<AuditReview.Result> whenDone) {
        super("Verifying the audit trail");
        this.access = access;
        this.query = query;
        this.whenDone = whenDone;
        setUser(true);
    }

    @Override
    protected IStatus run(IProgressMonitor monitor) {
        monitor.beginTask(getName(), IProgressMonitor.UNKNOWN);
        if (monitor.isCanceled()) {
            return Status.CANCEL_STATUS;
        }
        try (Connection c = access.connection()) {
            whenDone.accept(AuditReview.review(c, query));
            return Status.OK_STATUS;
        } catch (SQLException e) {
            return new Status(IStatus.ERROR, BatchQuantificationJob.PLUGIN,
                    "reading the audit trail failed: " + e.getMessage(), e);
        } finally {
            monitor.done();
        }
    }
}
