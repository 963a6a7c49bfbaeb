package org.tracegas.report;

import org.tracegas.report.internal.Check;

/**
 * The last record of the workspace's audit chain when the report was made: its sequence number and hash.
 * Printed on the report, it reveals a later rewrite of the chain up to that record. It is not part of the
 * content hash, since every new audit record moves it.
 */
public record AuditAnchor(long sequence, String hash) {

    public AuditAnchor {
        if (sequence < 1) {
            throw new IllegalArgumentException("sequence must be at least 1, was " + sequence);
        }
        Check.text("hash", hash);
    }
}
