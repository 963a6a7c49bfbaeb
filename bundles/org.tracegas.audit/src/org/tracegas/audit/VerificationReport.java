package org.tracegas.audit;

import java.util.List;

/**
 * Result of walking the audit chain. Immutable.
 *
 * @param recordsChecked number of stored records read
 * @param headSequence   last sequence number according to the chain head
 * @param headHash       last hash according to the chain head
 * @param findings       every break found, in chain order; empty when the chain is intact
 * @param truncated      whether more than {@link AuditVerifier#MAX_FINDINGS} breaks were found and the
 *                       rest left out
 */
public record VerificationReport(long recordsChecked, long headSequence, String headHash, List<ChainFinding> findings,
        boolean truncated) {

    public VerificationReport {
        findings = List.copyOf(findings);
    }

    /** Whether no break was found. */
    public boolean intact() {
        return findings.isEmpty();
    }

    /** Whether some finding of {@code kind} names {@code sequence}. */
    public boolean names(ChainFinding.Kind kind, long sequence) {
        return findings.stream().anyMatch(f -> f.kind() == kind && f.sequence() == sequence);
    }
}
