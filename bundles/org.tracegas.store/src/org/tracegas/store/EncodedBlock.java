package org.tracegas.store;

/**
 * A block of processed spectra made ready for storage by {@link BlockService#encode}: ids assigned, rows
 * encoded as they will be stored, and each row's SHA-256 for its binding to the audit trail taken. Only the
 * store that encoded it can store it, once.
 */
public interface EncodedBlock {

    /** The processed spectra it holds. */
    int size();
}
