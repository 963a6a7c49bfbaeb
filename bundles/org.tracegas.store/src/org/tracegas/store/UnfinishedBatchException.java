package org.tracegas.store;

/**
 * A batch was refused because another batch of the same project and method version is not finished yet: working
 * both would store the same samples' results twice. Nothing was written; work the other batch to the end (its
 * units are shared by any number of runners) instead of recording a new one.
 */
public class UnfinishedBatchException extends StoreException {

    private static final long serialVersionUID = 1L;

    private final String batchId;

    public UnfinishedBatchException(String batchId, String message) {
        super(message);
        this.batchId = batchId;
    }

    /** The unfinished batch that stands in the way. */
    public String batchId() {
        return batchId;
    }
}
