package org.tracegas.report.campaign;

import org.tracegas.audit.ChainAnchor;
import org.tracegas.audit.Signature;
import org.tracegas.audit.SignatureMeaning;
import org.tracegas.audit.SignatureRefusedException;
import org.tracegas.report.AuditAnchor;
import org.tracegas.report.ReportContent;
import org.tracegas.report.SignatureWords;
import org.tracegas.store.ReportSignatureRequest;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;
import org.tracegas.store.WorkspaceVerification;

/**
 * A report's review and approval signatures through the workspace store: signing its canonical content, and
 * printing the signatures found for its report id (those on earlier content are marked by the report) with
 * the audit chain's last record at report time.
 */
public final class ReportSignatures {

    private ReportSignatures() {
    }

    /**
     * Signs the report's content.
     *
     * @param authorId the user who made the report
     * @throws SignatureRefusedException wrong password, own report, another user's login (recorded)
     */
    public static Signature sign(WorkspaceStore store, Session signer, String projectId, ReportContent content,
            String authorId, String typedLogin, char[] password, SignatureMeaning meaning, String comment)
            throws SignatureRefusedException {
        store.audit().verifyWorkspace(java.util.List.of()).requireIntact("sign the report of project " + projectId);
        return store.reviews().sign(signer, new ReportSignatureRequest(projectId, content.campaign().reportId(),
                content.canonicalContent(), authorId, typedLogin, password, meaning, comment));
    }

    /**
     * The content with the review and approval signatures stored for its report id and the audit anchor of the
     * verification of the chain and the data it was made under; authorship and responsibility signatures are not
     * part of the report's review block.
     *
     * @param verified the verification the report's data were read under, intact (see
     *                 {@link WorkspaceVerification#requireIntact}); its chain head is the report's anchor
     */
    public static ReportContent attach(WorkspaceStore store, Session reader, String projectId,
            ReportContent content, WorkspaceVerification verified) {
        ReportContent signed = content;
        for (Signature s : store.reviews().signatures(reader, projectId, content.campaign().reportId())) {
            if (SignatureWords.printed(s.meaning())) {
                // the stored hash is the SHA-256 of the canonical content, that is the content hash signed
                signed = signed.withSignature(s);
            }
        }
        ChainAnchor head = verified.head();
        return head == null ? signed
                : signed.withAuditAnchor(new AuditAnchor(head.sequence(), head.hash(), verified.statement()));
    }
}
