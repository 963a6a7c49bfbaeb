package org.tracegas.qa.basis;

/** How an average stands against its emission limit. */
public enum LimitStatus {
    /** No limit applies to the compound and period. */
    NO_LIMIT("no limit"),
    /** The period lacks the data its validity rule asks for: it is not judged, neither within nor exceeded. */
    NOT_ASSESSED("not assessed (insufficient data)"),
    /** The validated value lies at or below the limit. */
    WITHIN("within limit"),
    /** The validated value lies above the limit. */
    EXCEEDED("exceeded");

    private final String label;

    LimitStatus(String label) {
        this.label = label;
    }

    /** How reports write it. */
    public String label() {
        return label;
    }
}
