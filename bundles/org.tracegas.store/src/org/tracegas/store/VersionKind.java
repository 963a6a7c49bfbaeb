package org.tracegas.store;

/** What a versioned item is. */
public enum VersionKind {
    /** An analysis method. */
    METHOD,
    /** A reference library. */
    LIBRARY
}
