package org.tracegas.store;

import java.time.Instant;

/**
 * A work unit claimed by one runner until {@code leaseUntil} (database time). The pair of runner id and
 * attempt identifies this claim: once the lease has expired and another runner claimed the unit, the
 * attempt is higher and this lease can no longer renew or complete it.
 *
 * @param seq        the unit's number in its batch, from 0
 * @param payload    what to process, e.g. a file path
 * @param attempt    how many times the unit has been claimed, this claim included
 */
public record WorkUnitLease(String batchId, int seq, String payload, String runnerId, int attempt,
        Instant leaseUntil) {

    /** The unit as it is named in error messages and audit records: batch id, slash, number. */
    public String unitName() {
        return batchId + "/" + seq;
    }
}
