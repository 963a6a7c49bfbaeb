package org.tracegas.importer;

/** Carries an {@link ImportException} through an {@link java.util.Iterator} of a streaming reader. */
public final class UncheckedImportException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    public UncheckedImportException(ImportException cause) {
        super(cause.getMessage(), cause);
    }

    @Override
    public synchronized ImportException getCause() {
        return (ImportException) super.getCause();
    }
}
