package org.tracegas.ui.jobs;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Locale;

import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.IStatus;
import org.eclipse.core.runtime.Status;
import org.eclipse.core.runtime.SubMonitor;
import org.eclipse.core.runtime.jobs.Job;
import org.tracegas.audit.Signature;
import org.tracegas.importer.ImportException;
import org.tracegas.method.StoredMethod;
import org.tracegas.model.ContentVersion;
import org.tracegas.model.Project;
import org.tracegas.report.AuditAnchor;
import org.tracegas.report.PdfReportWriter;
import org.tracegas.report.ReportContent;
import org.tracegas.report.SignatureWords;
import org.tracegas.report.campaign.CampaignReport;
import org.tracegas.report.campaign.ReportIdTakenException;
import org.tracegas.report.campaign.ReportPlan;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;

/**
 * Makes a project's campaign report in the background through the same code as the runner's {@code report}
 * command ({@link CampaignReport}): the workspace's audit chain and stored data verified first, the report made
 * from stored results and stored QA checks only, then report.pdf and results.csv written into the folder, each
 * whole or not at all. The closing message gives the files, the report id and content hash a signature is given
 * on, the audit anchor with the verification the report was made under, the QA readings that failed, and the
 * report's first caution.
 */
public final class CampaignReportJob extends Job {

    /** What the report was made from and where it goes. */
    public record Request(WorkspaceStore store, Session actor, Project project, ContentVersion version,
            StoredMethod method, Path plan, Path folder) {
    }

    /** The report as written. */
    public record Outcome(ReportContent content, CampaignReport.Written files) {

        /** QA readings of the report that failed. */
        public long failedQa() {
            return content.qa().stream().filter(q -> !q.passed()).count();
        }
    }

    private final Request request;
    private final String software;
    private volatile Outcome outcome;

    /** @param software what the report states as its software */
    public CampaignReportJob(Request request, String software) {
        super("Making the report of " + request.project().getCode() + " with " + request.method().method().name()
                + " version " + request.version().getNumber());
        this.request = request;
        this.software = software;
        setUser(true);
    }

    @Override
    protected IStatus run(IProgressMonitor monitor) {
        SubMonitor progress = SubMonitor.convert(monitor, getName(), 10);
        CampaignReport report = new CampaignReport(request.store(), request.actor(), request.project().getId(),
                software);
        ReportContent content;
        try {
            progress.subTask("Reading the plan " + request.plan().getFileName());
            ReportPlan plan = ReportPlan.read(request.plan());
            progress.worked(1);
            progress.subTask("Verifying the audit chain and reading the stored results and QA checks");
            content = report.content(request.version(), request.method(), plan);
            progress.worked(7);
        } catch (IOException | ImportException | RuntimeException e) {
            return Status.error("the report of " + request.project().getCode() + " could not be made: " + e.getMessage()
                    + "; nothing written", e);
        }
        // the last point at which stopping leaves nothing behind: the files are written next
        if (progress.isCanceled()) {
            return Status.CANCEL_STATUS;
        }
        CampaignReport.Written files;
        try {
            progress.subTask("Writing report.pdf and results.csv into " + request.folder());
            files = report.writeInto(content, request.version(), request.method(), request.folder());
            progress.worked(2);
        } catch (ReportIdTakenException e) {
            return Status.error(e.getMessage() + "; give this report its own report-id in the plan "
                    + request.plan() + " (nothing written)", e);
        } catch (IOException | RuntimeException e) {
            return Status.error("the report of " + request.project().getCode() + " could not be written to "
                    + request.folder() + ": " + e.getMessage() + "; nothing written", e);
        }
        outcome = new Outcome(content, files);
        return Status.info(summary(outcome));
    }

    /** What the report is made from. */
    public Request request() {
        return request;
    }

    /** The report written; null until the job wrote it. */
    public Outcome outcome() {
        return outcome;
    }

    /** The closing message: files, what a signature is given on, the verification, QA and the first caution. */
    static String summary(Outcome outcome) {
        ReportContent c = outcome.content();
        StringBuilder b = new StringBuilder("Wrote report ").append(c.campaign().reportId()).append(" to ")
                .append(outcome.files().pdf()).append(" with ").append(outcome.files().csv().getFileName())
                .append(". Content hash (SHA-256) ").append(c.contentHash()).append('.');
        c.auditAnchor().ifPresent(a -> b.append(' ').append(anchor(a)));
        for (Signature s : c.signatures()) {
            b.append(" Signed: ").append(SignatureWords.noun(s.meaning()).toUpperCase(Locale.ROOT)).append(" by ")
                    .append(s.printedName()).append(s.contentSha256().equals(c.contentHash()) ? "" : " (on earlier content)").append('.');
        }
        if (c.signatures().isEmpty()) {
            b.append(" Not signed yet.");
        }
        long failed = outcome.failedQa();
        b.append(failed == 0 ? " Every QA reading passed." : " " + failed + " of " + c.qa().size()
                + " QA readings failed; the report says so on its first page.");
        // the gases are toxic: the desk repeats the report's own first caution
        return b.append(" Caution: ").append(PdfReportWriter.STANDARD_CAUTIONS.get(0)).toString();
    }

    private static String anchor(AuditAnchor a) {
        return "Audit anchor #" + a.sequence() + " " + a.hash()
                + (a.verification() == null ? "." : " (" + a.verification() + ").");
    }
}
