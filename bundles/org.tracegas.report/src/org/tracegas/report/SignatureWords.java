package org.tracegas.report;

import java.util.List;

import org.tracegas.audit.SignatureMeaning;

/**
 * The words a report prints for the meaning of a signature in its review block. Only review and approval are
 * printed there; authorship and responsibility signatures are not part of a report's review block.
 */
public final class SignatureWords {

    /** The meanings a report prints, in the order of its review block. */
    public static final List<SignatureMeaning> PRINTED = List.of(SignatureMeaning.REVIEWED, SignatureMeaning.APPROVED);

    private SignatureWords() {
    }

    /** Whether a report prints signatures of this meaning. */
    public static boolean printed(SignatureMeaning meaning) {
        return PRINTED.contains(meaning);
    }

    /**
     * "Review" or "Approval".
     *
     * @throws IllegalArgumentException when the report does not print signatures of {@code meaning}
     */
    public static String noun(SignatureMeaning meaning) {
        return switch (require(meaning)) {
            case REVIEWED -> "Review";
            default -> "Approval";
        };
    }

    /**
     * "Reviewed" or "Approved".
     *
     * @throws IllegalArgumentException when the report does not print signatures of {@code meaning}
     */
    public static String pastTense(SignatureMeaning meaning) {
        return switch (require(meaning)) {
            case REVIEWED -> "Reviewed";
            default -> "Approved";
        };
    }

    /**
     * What the meaning says on the report, e.g. "Review: the content was checked by qualified staff".
     *
     * @throws IllegalArgumentException when the report does not print signatures of {@code meaning}
     */
    public static String explanation(SignatureMeaning meaning) {
        return switch (require(meaning)) {
            case REVIEWED -> "Review: the content was checked by qualified staff";
            default -> "Approval: the report is released";
        };
    }

    static SignatureMeaning require(SignatureMeaning meaning) {
        if (!printed(meaning)) {
            throw new IllegalArgumentException("meaning: a report prints review and approval signatures only, was "
                    + meaning);
        }
        return meaning;
    }
}
