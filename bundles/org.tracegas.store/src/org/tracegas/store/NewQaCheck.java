package org.tracegas.store;

/**
 * The outcome of one QA check to store with a project: what was checked, the value, the acceptance limits,
 * pass or fail, and the rule that decided it with its source.
 *
 * @param lower lowest accepted value (negative infinity when there is none)
 * @param upper highest accepted value (positive infinity when there is none)
 */
public record NewQaCheck(String check, boolean passed, double measured, String unit, double lower, double upper,
        String rule, String source) {

    /** @throws IllegalArgumentException naming the field that is blank, or limits that are not numbers */
    public NewQaCheck {
        for (String[] field : new String[][] { { "check", check }, { "unit", unit }, { "rule", rule },
                { "source", source } }) {
            if (field[1] == null || (field[1].isBlank() && !field[0].equals("unit"))) {
                throw new IllegalArgumentException(field[0] + " of a QA check must not be blank");
            }
        }
        // the measured value may be NaN: a check without a usable value is stored as failed
        if (Double.isNaN(lower) || Double.isNaN(upper)) {
            throw new IllegalArgumentException("limits of QA check " + check + " must be numbers");
        }
    }
}
