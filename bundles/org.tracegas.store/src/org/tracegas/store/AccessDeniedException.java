package org.tracegas.store;

/** The signed-in user lacks the role or the project grant an operation needs. Nothing was written. */
public class AccessDeniedException extends StoreException {

    private static final long serialVersionUID = 1L;

    public AccessDeniedException(String message) {
        super(message);
    }
}
