package org.tracegas.store;

/**
 * A runner used a work-unit lease that is no longer its own: the unit was claimed again by another runner
 * after the lease expired, was released, or is already done. Nothing was written; drop the unit's work.
 */
public class LeaseLostException extends StoreException {

    private static final long serialVersionUID = 1L;

    public LeaseLostException(String message) {
        super(message);
    }
}
