package org.tracegas.audit;

/**
 * Meaning of an electronic signature, shown with it (21 CFR 11.50(a)(3): "such as review, approval,
 * responsibility, or authorship").
 */
public enum SignatureMeaning {
    /** The signer wrote or produced the record. */
    AUTHORED(false),
    /** The signer reviewed the record. */
    REVIEWED(true),
    /** The signer approved the record. */
    APPROVED(true),
    /** The signer takes responsibility for the record. */
    RESPONSIBLE(false);

    private final boolean independent;

    SignatureMeaning(boolean independent) {
        this.independent = independent;
    }

    /** Whether the signer must not be the author of the signed object (nobody reviews or approves own work). */
    public boolean requiresIndependentSigner() {
        return independent;
    }
}
