package org.tracegas.audit;

/**
 * A signing attempt was refused. The refusal itself has been recorded in the audit trail and committed
 * ({@link #refusalRecord()}).
 */
public final class SignatureRefusedException extends Exception {

    private static final long serialVersionUID = 1L;

    /** Why a signature was refused. */
    public enum Reason {
        /** User id and password did not match (21 CFR 11.200(a)(1)). */
        WRONG_CREDENTIALS,
        /** The signer is the author of the object and the meaning requires an independent signer. */
        OWN_WORK,
        /** The typed user id is not the user logged in at the workstation. */
        NOT_SESSION_USER
    }

    private final Reason reason;
    private final transient AuditRecord refusalRecord;

    public SignatureRefusedException(Reason reason, AuditRecord refusalRecord) {
        super("signature refused (" + reason + ") for " + refusalRecord.objectType() + " "
                + refusalRecord.objectId() + " version " + refusalRecord.objectVersion()
                + "; recorded as audit record " + refusalRecord.sequence());
        this.reason = reason;
        this.refusalRecord = refusalRecord;
    }

    public Reason reason() {
        return reason;
    }

    /** The committed audit record of the refused attempt. */
    public AuditRecord refusalRecord() {
        return refusalRecord;
    }
}
