package org.tracegas.store;

import java.util.List;

import org.tracegas.audit.Signature;
import org.tracegas.audit.SignatureRefusedException;

/**
 * Electronic review and approval of a project's reports. A signature binds to the SHA-256 of the exact report
 * content it was given on; a report made again from stored data finds its signatures here and shows whether
 * each one covers its present content. Signatures are audit records, chained like every other record.
 */
public interface ReviewService {

    /** Object type of reports in the audit trail. */
    String OBJECT_TYPE = "report";

    /**
     * Signs one report content in the signer's session: the typed login and password are checked again (a wrong
     * password counts towards the lock-out like a failed log-in), and nobody reviews or approves a report they
     * made. A refused attempt is recorded in the audit trail before the exception is thrown.
     *
     * @throws SignatureRefusedException wrong credentials, the signer's own report, or another user's login
     * @throws AccessDeniedException     if the signer cannot read the project
     */
    Signature sign(Session signer, ReportSignatureRequest request) throws SignatureRefusedException;

    /**
     * Every signature given on a report of the project, on whatever content, in the order given.
     *
     * @throws AccessDeniedException if the reader cannot read the project
     */
    List<Signature> signatures(Session reader, String projectId, String reportId);
}
