package org.tracegas.store;

/** An identifier names no stored object of the expected type. */
public class NoSuchObjectException extends StoreException {

    private static final long serialVersionUID = 1L;

    public NoSuchObjectException(String objectType, String objectId) {
        super("no " + objectType + " with id " + objectId);
    }
}
