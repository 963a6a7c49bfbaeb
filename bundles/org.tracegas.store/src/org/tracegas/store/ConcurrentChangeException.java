package org.tracegas.store;

/**
 * A write carried a row version that is no longer current: someone else changed the object in the
 * meantime. Nothing was written; reload the object and apply the change again.
 */
public class ConcurrentChangeException extends StoreException {

    private static final long serialVersionUID = 1L;

    private final String objectType;
    private final String objectId;
    private final long expectedVersion;
    private final long currentVersion;

    public ConcurrentChangeException(String objectType, String objectId, long expectedVersion,
            long currentVersion) {
        super(objectType + " " + objectId + " was changed by someone else: the change was made on version "
                + expectedVersion + " but the stored version is " + currentVersion + "; nothing was written");
        this.objectType = objectType;
        this.objectId = objectId;
        this.expectedVersion = expectedVersion;
        this.currentVersion = currentVersion;
    }

    public String objectType() {
        return objectType;
    }

    public String objectId() {
        return objectId;
    }

    /** The row version the writer had read. */
    public long expectedVersion() {
        return expectedVersion;
    }

    /** The row version stored when the write was refused. */
    public long currentVersion() {
        return currentVersion;
    }
}
