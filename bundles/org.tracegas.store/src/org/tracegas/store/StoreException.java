package org.tracegas.store;

/** Root of the storage errors; a database failure is wrapped with the operation that failed. */
public class StoreException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    public StoreException(String message) {
        super(message);
    }

    public StoreException(String message, Throwable cause) {
        super(message, cause);
    }
}
