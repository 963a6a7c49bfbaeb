package org.tracegas.store;

import org.tracegas.model.WorkBatch;

/**
 * The checks a new work batch passes where it comes into the store, before anything is written: a model
 * {@link WorkBatch} can be built with any values.
 */
public final class WorkBatchChecks {

    private WorkBatchChecks() {
    }

    /**
     * Checks what the creator of a batch gives: a description of at most {@link WorkUnitService#MAX_TEXT_LENGTH}
     * characters (it may be empty) and a method version id that is null (a batch of other work) or not blank.
     * Id, unit count, creator and time are the store's to set and are not looked at.
     *
     * @throws IllegalArgumentException naming the field that is missing or wrong
     */
    public static void requireNew(WorkBatch batch) {
        if (batch == null) {
            throw new IllegalArgumentException("batch must not be null");
        }
        String description = batch.getDescription();
        if (description == null || description.length() > WorkUnitService.MAX_TEXT_LENGTH) {
            throw new IllegalArgumentException("description must be given and at most "
                    + WorkUnitService.MAX_TEXT_LENGTH + " characters long, was "
                    + (description == null ? null : description.length() + " characters"));
        }
        String methodVersionId = batch.getMethodVersionId();
        if (methodVersionId != null && methodVersionId.isBlank()) {
            throw new IllegalArgumentException("methodVersionId must name a METHOD version or be null for a batch"
                    + " of other work, was blank");
        }
    }
}
