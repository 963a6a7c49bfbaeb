package org.tracegas.ui.jobs;

import java.util.function.Consumer;

import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.IStatus;
import org.eclipse.core.runtime.Status;
import org.eclipse.core.runtime.jobs.Job;
import org.tracegas.audit.AuditQuery;
import org.tracegas.audit.AuditReview;
import org.tracegas.store.Session;
import org.tracegas.store.StoreException;
import org.tracegas.store.WorkspaceStore;

/**
 * Reads the audit records matching a filter and verifies the whole hash chain in one snapshot, through the
 * store, in the background. The chain walk itself cannot be interrupted; cancelling before it starts skips it.
 */
public final class ChainVerificationJob extends Job {

    private final WorkspaceStore store;
    private final Session reader;
    private final AuditQuery query;
    private final Consumer<AuditReview.Result> whenDone;
    private final Consumer<String> whenFailed;

    /**
     * @param reader     the signed-in user; the store lets reviewers, quality managers and administrators read
     * @param whenDone   receives the result in the job's thread (pass on with Display.asyncExec)
     * @param whenFailed receives the reason, e.g. a refusal of the reader, in the job's thread
     */
    public ChainVerificationJob(WorkspaceStore store, Session reader, AuditQuery query,
            Consumer<AuditReview.Result> whenDone, Consumer<String> whenFailed) {
        super("Verifying the audit trail");
        this.store = store;
        this.reader = reader;
        this.query = query;
        this.whenDone = whenDone;
        this.whenFailed = whenFailed;
        setUser(true);
    }

    @Override
    protected IStatus run(IProgressMonitor monitor) {
        monitor.beginTask(getName(), IProgressMonitor.UNKNOWN);
        if (monitor.isCanceled()) {
            return Status.CANCEL_STATUS;
        }
        try {
            whenDone.accept(store.audit().review(reader, query));
            return Status.OK_STATUS;
        } catch (StoreException e) {
            whenFailed.accept(e.getMessage());
            // the view shows the failure; the job ends quietly instead of raising a second dialog
            return Status.OK_STATUS;
        } finally {
            monitor.done();
        }
    }
}
