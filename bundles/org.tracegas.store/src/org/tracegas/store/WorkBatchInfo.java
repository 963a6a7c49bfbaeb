package org.tracegas.store;

import java.time.Instant;

/**
 * A batch of work split into units.
 *
 * @param unitCount number of units, numbered 0 to unitCount - 1
 * @param createdBy the user who created it
 */
public record WorkBatchInfo(String id, String projectId, String description, int unitCount, String createdBy,
        Instant createdAt) {
}
