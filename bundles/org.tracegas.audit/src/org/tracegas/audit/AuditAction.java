package org.tracegas.audit;

/**
 * What an audit record reports. 21 CFR 11.10(e) asks for operator entries and actions that create,
 * modify or delete electronic records; the other values cover signatures and access.
 */
public enum AuditAction {
    /** A record was created. */
    CREATE,
    /** A record was modified; old and new values are kept side by side. */
    CHANGE,
    /** A record was deleted (the prior values stay in the trail). */
    DELETE,
    /** A decision on data, such as accepting or rejecting a QA result. */
    DECISION,
    /** An electronic signature (review, approval ...), see {@link SignatureService}. */
    SIGNATURE,
    /** An attempt that was refused, e.g. a signature with wrong credentials or on one's own work. */
    REFUSED,
    /** A user logged in. */
    LOGIN,
    /** A user logged out. */
    LOGOUT,
    /** Data were exported or printed. */
    EXPORT
}
