package org.tracegas.audit;

/**
 * One break of the audit chain found by {@link AuditVerifier}.
 *
 * @param kind     what was found
 * @param sequence the sequence number concerned: of the record itself for {@link Kind#ALTERED},
 *                 {@link Kind#INSERTED} and {@link Kind#REORDERED}; the first missing sequence number for
 *                 {@link Kind#REMOVED}
 * @param recordId id of the record concerned; for {@link Kind#REMOVED} the record after the gap (whose link
 *                 shows the removal), or the removed last record's id as kept by the chain head, or null
 * @param detail   human-readable explanation
 */
public record ChainFinding(Kind kind, long sequence, String recordId, String detail) {

    /** Kinds of tampering the verifier tells apart. */
    public enum Kind {
        /** Stored fields no longer give the stored hash, or the record was re-hashed after a change. */
        ALTERED,
        /** A record (or records) missing from the chain. */
        REMOVED,
        /** A record that is not part of the chain: it links to nothing, or the chain skips it. */
        INSERTED,
        /** A genuine record found at the wrong position. */
        REORDERED
    }

    @Override
    public String toString() {
        return kind + " at sequence " + sequence + (recordId == null ? "" : " (record " + recordId + ")") + ": " + detail;
    }
}
