package org.tracegas.store;

import java.io.IOException;
import java.io.Writer;

import java.util.List;

import org.tracegas.audit.AuditQuery;
import org.tracegas.audit.AuditReview;
import org.tracegas.audit.ChainAnchor;
import org.tracegas.audit.VerificationReport;

/**
 * The audit trail for review and copying (21 CFR 11.10(e); EU GMP Annex 11 section 9: the trail is regularly
 * reviewed). Reviewers, quality managers and administrators read its records; analysts, whose work it
 * records, do not. Each call reads in one snapshot of the workspace.
 */
public interface AuditService {

    /**
     * The records matching the query in sequence order, together with the verification of the whole chain,
     * read in one snapshot.
     *
     * @throws AccessDeniedException unless the reader is a reviewer, quality manager or administrator
     */
    AuditReview.Result review(Session reader, AuditQuery query);

    /**
     * Writes the records matching the query as CSV ({@link AuditReview#CSV_HEADER}, RFC 4180, times in ISO-8601
     * UTC), streamed from the database.
     *
     * @return the number of records written
     * @throws AccessDeniedException unless the reader is a reviewer, quality manager or administrator
     * @throws IOException           if writing to {@code out} fails
     */
    long exportCsv(Session reader, AuditQuery query, Writer out) throws IOException;

    /** Object type of the records of an installation's software (see {@link #recordSoftware}). */
    String SOFTWARE_OBJECT = "installed-software";

    /**
     * Records the software of the installation that opens the workspace when it differs from what was last
     * recorded for that installation: a record of object type {@value #SOFTWARE_OBJECT} with the installation
     * as object id, the previous and the current description side by side, and {@code reason} (who installed,
     * updated or removed which add-on, and when). Any logged-in user's opening may write it: it records the
     * state of the software the workspace is used with, not a decision of that user.
     *
     * @param installation where the software is installed (its folder), not blank
     * @param software     what is installed, e.g. the product and its add-on features with versions, not blank
     * @param reason       how it came to differ, not blank
     * @return whether a record was written (false when the software is as last recorded)
     */
    boolean recordSoftware(Session actor, String installation, String software, String reason);

    /** Object type of the records of a project's results written to a file (see {@link #recordExport}). */
    String EXPORT_OBJECT = "results-export";

    /**
     * Records that a project's stored results were written to a file: an {@link org.tracegas.audit.AuditAction#EXPORT}
     * record of object type {@value #EXPORT_OBJECT} with the project as object id, and as its new value the file's
     * name, the number of results and the SHA-256 of the bytes written, so that a copy met later can be matched
     * to its export. Anyone who may read the project's results may export them.
     *
     * @param fileName where the results went, not blank
     * @param results  how many results were written, not negative
     * @param sha256   SHA-256 of the file's bytes, 64 hex digits
     * @throws AccessDeniedException without read access to the project
     */
    void recordExport(Session actor, String projectId, String fileName, long results, String sha256);

    /**
     * Walks the whole chain and reports every record that was altered, removed, inserted or reordered. Needs no
     * session: the report holds the chain's state and the positions of findings, not the records' content.
     */
    VerificationReport verify();

    /**
     * Verifies the chain (and that it still passes through each anchor) and every stored data row against the
     * audit record that vouches for it, in one snapshot and in bounded memory (rows are streamed). Names every
     * data row that was changed, deleted or inserted outside the store's services. Needs no session, as
     * {@link #verify()}.
     *
     * @param anchors chain positions kept outside the database (printed on reports); may be empty
     */
    WorkspaceVerification verifyWorkspace(List<ChainAnchor> anchors);
}
