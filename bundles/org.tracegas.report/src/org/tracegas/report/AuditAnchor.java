package org.tracegas.report;

import org.tracegas.report.internal.Check;

/**
 * The last record of the workspace's audit chain when the report was made: its sequence number and hash, and
 * the verification of the chain and the stored data the report was made under. Printed on the report, it
 * reveals a later rewrite of the chain up to that record. It is not part of the content hash, since every new
 * audit record moves it.
 *
 * @param verification what was verified before the report was made and the outcome, or null when unknown
 */
public record AuditAnchor(long sequence, String hash, String verification) {

    public AuditAnchor {
        if (sequence < 1) {
            throw new IllegalArgumentException("sequence must be at least 1, was " + sequence);
        }
        Check.text("hash", hash);
    }

    /** An anchor without a statement of verification. */
    public AuditAnchor(long sequence, String hash) {
        this(sequence, hash, null);
    }
}
