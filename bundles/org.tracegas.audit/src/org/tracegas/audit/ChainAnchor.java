package org.tracegas.audit;

import org.tracegas.audit.internal.ChainHash;

/**
 * A chain position and its hash kept outside the database (printed on a report, filed with an export).
 * Because the chain hashes carry no secret, someone with full database access could rewrite the chain
 * from some record on and the head with it; verifying against an anchor taken earlier reveals that.
 *
 * @param sequence sequence number of the anchored record, at least 1
 * @param hash     its hash, 64 lower-case hex digits
 */
public record ChainAnchor(long sequence, String hash) {

    /** @throws IllegalArgumentException naming the field that is out of range or malformed */
    public ChainAnchor {
        if (sequence < 1) {
            throw new IllegalArgumentException("sequence: must be at least 1, was " + sequence);
        }
        if (!ChainHash.isSha256Hex(hash)) {
            throw new IllegalArgumentException("hash: not 64 lower-case hex digits: " + hash);
        }
    }

    /**
     * Reads an anchor written as {@code <sequence>:<hash>}, the form {@link #text()} writes and reports print.
     *
     * @throws IllegalArgumentException naming what is wrong with {@code text}
     */
    public static ChainAnchor parse(String text) {
        String t = text == null ? "" : text.strip();
        int colon = t.indexOf(':');
        if (colon < 1) {
            throw new IllegalArgumentException("anchor: expected <sequence>:<hash>, was '" + text + "'");
        }
        long sequence;
        try {
            sequence = Long.parseLong(t.substring(0, colon));
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException("anchor: sequence '" + t.substring(0, colon) + "' is not a whole number");
        }
        return new ChainAnchor(sequence, t.substring(colon + 1));
    }

    /** {@code <sequence>:<hash>}, as {@link #parse} reads it. */
    public String text() {
        return sequence + ":" + hash;
    }

    /** The anchor of the chain's last record as given by a verification report, or null for an empty chain. */
    public static ChainAnchor headOf(VerificationReport report) {
        return report.headSequence() == 0 ? null : new ChainAnchor(report.headSequence(), report.headHash());
    }
}
