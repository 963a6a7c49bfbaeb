package org.tracegas.ui.session;

import java.util.ArrayList;
import java.util.List;

import org.tracegas.audit.Signature;
import org.tracegas.audit.SignatureMeaning;
import org.tracegas.audit.SignatureRefusedException;
import org.tracegas.report.ReportContent;
import org.tracegas.report.campaign.CampaignReport;
import org.tracegas.report.campaign.ReportSignatures;
import org.tracegas.store.WorkspaceVerification;
import org.tracegas.ui.jobs.AnalysisRuns;
import org.tracegas.ui.jobs.CampaignReportJob;

/**
 * Electronic review and approval of a report the desk made, through the code the runner's {@code report-sign}
 * signs with ({@link ReportSignatures}): the signature binds to the report's content hash, the store checks the
 * password typed again and refuses a signer who recorded any of the report's results or QA checks. The state of
 * the signatures is told against the content the desk made, so a signature on earlier content shows as such.
 */
public final class ReportApproval {

    /** The state of a report reviewed and approved on its present content. */
    public static final String COMPLETE = "Reviewed and approved on this content.";

    private final CampaignReportJob.Request request;
    private final ReportContent content;

    /** @param content the report content made from the request */
    public ReportApproval(CampaignReportJob.Request request, ReportContent content) {
        this.request = request;
        this.content = content;
    }

    /** The report's id and project, and the hash a signature is given on. */
    public String description() {
        return content.campaign().reportId() + " of " + request.project().getCode() + ", content hash "
                + content.contentHash().substring(0, 16) + "… (SHA-256)";
    }

    /** The printed name of the desk's user, shown with the signature. */
    public String printedName() {
        return request.store().users().user(request.actor().userId()).getDisplayName();
    }

    /**
     * Signs the report's content in the desk's session.
     *
     * @throws SignatureRefusedException wrong password, own report, another user's login (recorded)
     * @throws org.tracegas.store.StoreException if the audit chain or the stored data did not verify, or the
     *                                           signature could not be stored
     */
    public Signature sign(String typedLogin, char[] password, SignatureMeaning meaning, String comment)
            throws SignatureRefusedException {
        CampaignReport report = new CampaignReport(request.store(), request.actor(), request.project().getId(),
                AnalysisRuns.software());
        // whoever recorded any of the report's results or checks is its author; naming the signer as the author
        // then lets the store refuse the signature and record the refused attempt
        List<String> authors = report.authors(request.version().getId());
        String author = authors.contains(request.actor().userId()) ? request.actor().userId() : authors.get(0);
        return ReportSignatures.sign(request.store(), request.actor(), request.project().getId(), content, author,
                typedLogin, password, meaning, comment == null || comment.isBlank() ? null : comment);
    }

    /** Every signature given on the report's id, on whatever content, in the order given. */
    public List<Signature> signatures() {
        return request.store().reviews().signatures(request.actor(), request.project().getId(),
                content.campaign().reportId());
    }

    /** Whether a signature was given on exactly this report content. */
    public boolean onThisContent(Signature s) {
        return s.contentSha256().equals(content.contentHash());
    }

    /**
     * {@link #COMPLETE}, or what is missing: the review, the approval, each counted only on
     * this content (a signature on earlier content covers other numbers).
     */
    public String state(List<Signature> signatures) {
        boolean reviewed = signatures.stream().anyMatch(s -> s.meaning() == SignatureMeaning.REVIEWED
                && onThisContent(s));
        boolean approved = signatures.stream().anyMatch(s -> s.meaning() == SignatureMeaning.APPROVED
                && onThisContent(s));
        if (reviewed && approved) {
            return COMPLETE;
        }
        List<String> missing = new ArrayList<>();
        if (!reviewed) {
            missing.add("a review");
        }
        if (!approved) {
            missing.add("an approval");
        }
        return "Needs " + String.join(" and ", missing) + " on this content, each by someone who recorded none of"
                + " its results or QA checks.";
    }

    /** Verifies the audit chain and the data bound to it now (reads every bound row: call it off the UI thread). */
    public WorkspaceVerification verifyNow() {
        return request.store().audit().verifyWorkspace(List.of());
    }

    public ReportContent content() {
        return content;
    }

    public CampaignReportJob.Request request() {
        return request;
    }
}
