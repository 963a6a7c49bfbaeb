package org.tracegas.store;

import org.tracegas.model.Result;

/**
 * The checks every new result passes, whichever way it is stored: a model {@link Result} can be built with any
 * values, so the store refuses an incomplete one where it comes in, before anything is written.
 */
public final class ResultChecks {

    private ResultChecks() {
    }

    /**
     * Checks compound, unit and provenance (whose own checks name blank versions, a blank software version and
     * an input hash that is no SHA-256).
     *
     * @param where prefix of the field names in the message, e.g. {@code "results[3]."}, or ""
     * @throws IllegalArgumentException naming the field that is missing or blank
     */
    public static void requireComplete(Result result, String where) {
        if (result == null) {
            throw new IllegalArgumentException(where.isEmpty() ? "result must not be null"
                    : where.substring(0, where.length() - 1) + " is null");
        }
        requireText(where, "compound", result.getCompound());
        requireText(where, "unit", result.getUnit());
        if (result.getProvenance() == null) {
            throw new IllegalArgumentException(where + "provenance must not be null: a result names the method and"
                    + " library versions, the software and the input that made it");
        }
    }

    private static void requireText(String where, String field, String value) {
        if (value == null || value.isBlank()) {
            throw new IllegalArgumentException(where + field + " must not be blank");
        }
    }
}
