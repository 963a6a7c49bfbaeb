package org.tracegas.store;

import java.time.Instant;

/**
 * A batch of work split into units.
 *
 * @param methodVersionId the METHOD version the batch quantifies with, or null for a batch of other work
 * @param unitCount       number of units, numbered 0 to unitCount - 1
 * @param createdBy       the user who created it
 */
public record WorkBatchInfo(String id, String projectId, String methodVersionId, String description, int unitCount,
        String createdBy, Instant createdAt) {
}
