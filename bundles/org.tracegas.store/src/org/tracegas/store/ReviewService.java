package org.tracegas.store;

import java.util.List;
import java.util.Optional;

import org.tracegas.audit.Signature;
import org.tracegas.audit.SignatureRefusedException;

/**
 * Electronic review and approval of a project's reports and stored results. A report signature binds to the
 * SHA-256 of the exact report content it was given on; a report made again from stored data finds its signatures
 * here and shows whether each one covers its present content. A result signature binds to the result's stored
 * values and what made them. Signatures are audit records, chained like every other record.
 *
 * <p>Every signing checks the typed login and password again (a wrong password counts towards the lock-out like
 * a failed log-in), and nobody reviews or approves their own report or result. A refused attempt is recorded in
 * the audit trail before the exception is thrown.
 */
public interface ReviewService {

    /** Object type of reports in the audit trail. */
    String OBJECT_TYPE = "report";

    /** Object type of results in the audit trail. */
    String RESULT_TYPE = "result";

    /**
     * Signs one report content in the signer's session.
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

    /**
     * The code of another project of the workspace that has issued or signed a report of this id, if any: a
     * report id names one report in the whole workspace, so that a signature quoted by its report id is never
     * ambiguous.
     */
    Optional<String> otherProjectWithReport(String projectId, String reportId);

    /**
     * Signs a stored result in the signer's session. The signed content is the UTF-8 text of the lines
     * {@code result, compound, concentration, uncertainty, detection_limit, unit, method_version,
     * library_version, input_sha256, recorded_by, recorded} as {@code name=value}, each ending in a line feed,
     * numbers as {@link Double#toString(double)} and the time as ISO-8601 UTC: the values and exactly what made
     * them. The author checked against is the user who recorded the result.
     *
     * @throws SignatureRefusedException wrong credentials, the signer's own result, or another user's login
     * @throws NoSuchObjectException     if there is no such result
     * @throws AccessDeniedException     if the signer cannot read the result's project
     */
    Signature signResult(Session signer, ResultSignatureRequest request) throws SignatureRefusedException;

    /**
     * Every signature given on a stored result, in the order given.
     *
     * @throws NoSuchObjectException if there is no such result
     * @throws AccessDeniedException if the reader cannot read the result's project
     */
    List<Signature> resultSignatures(Session reader, String resultId);
}
