package org.tracegas.model;

/** New work batches made from what their creator gives, in one call. */
public final class WorkBatches {

    private WorkBatches() {
    }

    /**
     * A new work batch, not yet stored: without id, project, unit count, creating user and time, which the store
     * sets on the batch it creates.
     *
     * @param methodVersionId the method version the batch quantifies with, or null for a batch of other work
     */
    public static WorkBatch of(String methodVersionId, String description) {
        WorkBatch b = WorkspaceFactory.eINSTANCE.createWorkBatch();
        b.setMethodVersionId(methodVersionId);
        b.setDescription(description);
        return b;
    }
}
