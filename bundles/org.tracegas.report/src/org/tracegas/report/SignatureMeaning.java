package org.tracegas.report;

/** What an electronic signature on a report means. */
public enum SignatureMeaning {
    /** The content was reviewed by qualified staff. */
    REVIEW("Reviewed", "Review"),
    /** The report was approved for release. */
    APPROVAL("Approved", "Approval");

    private final String pastTense;
    private final String noun;

    SignatureMeaning(String pastTense, String noun) {
        this.pastTense = pastTense;
        this.noun = noun;
    }

    /** For example "Reviewed". */
    public String pastTense() {
        return pastTense;
    }

    /** For example "Review". */
    public String noun() {
        return noun;
    }
}
