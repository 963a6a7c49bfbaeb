package org.tracegas.store;

/**
 * A stored data row, or a binding list, that no longer matches what the audit trail vouches for: found by
 * {@link AuditService#verifyWorkspace}. The row is named by its kind and key; the audit record by its sequence
 * number.
 *
 * @param kind          what was found
 * @param dataKind      kind of the row, e.g. "result", "measurement", "spectral-data"; "audit-record" for
 *                      {@link Kind#BINDINGS_ALTERED} and {@link Kind#BINDINGS_REMOVED}
 * @param rowKey        the row's id (project grants: {@code <project id>/<user id>}); the record's sequence
 *                      number for findings about a binding list
 * @param auditSequence the audit record that vouches for the row as it should be; 0 when none does
 * @param detail        human-readable explanation
 */
public record DataFinding(Kind kind, String dataKind, String rowKey, long auditSequence, String detail) {

    /** Kinds of change the verification tells apart. */
    public enum Kind {
        /** The row's content differs from the content its newest audit record vouches for. */
        CHANGED,
        /** A row an audit record vouches for is no longer stored. */
        DELETED,
        /** A stored row no audit record vouches for. */
        INSERTED,
        /** An audit record's list of bound rows no longer gives the digest the record holds. */
        BINDINGS_ALTERED,
        /** An audit record vouches for data rows, but their list is gone. */
        BINDINGS_REMOVED
    }

    @Override
    public String toString() {
        return kind + " " + dataKind + " " + rowKey + (auditSequence == 0 ? ", vouched for by no audit record"
                : ", vouched for by audit record " + auditSequence) + ": " + detail;
    }
}
