package org.tracegas.library;

import java.util.Objects;

/**
 * Immutable identity of a compound: name, CAS registry number, formula and molar mass.
 *
 * @param name      common name, not blank
 * @param casNumber CAS registry number in the form NNNNNNN-NN-N; the check digit is verified
 * @param formula   molecular formula, not blank
 * @param molarMass molar mass in g/mol, positive and finite
 */
public record Compound(String name, String casNumber, String formula, double molarMass) {

    public Compound {
        requireText(name, "name");
        requireText(formula, "formula");
        requireCasNumber(casNumber);
        if (!(molarMass > 0 && Double.isFinite(molarMass))) {
            throw new IllegalArgumentException("molarMass must be positive and finite, was " + molarMass);
        }
    }

    private static void requireText(String value, String field) {
        if (value == null || value.isBlank()) {
            throw new IllegalArgumentException(field + " must not be blank");
        }
    }

    /** The check digit rule of the CAS registry: weighted digit sum modulo 10 (common practice, no source). */
    private static void requireCasNumber(String cas) {
        Objects.requireNonNull(cas, "casNumber");
        if (!cas.matches("\\d{2,7}-\\d{2}-\\d")) {
            throw new IllegalArgumentException("casNumber must look like NNNNNNN-NN-N, was '" + cas + "'");
        }
        String digits = cas.replace("-", "");
        int check = digits.charAt(digits.length() - 1) - '0';
        int sum = 0;
        for (int i = digits.length() - 2, weight = 1; i >= 0; i--, weight++) {
            sum += weight * (digits.charAt(i) - '0');
        }
        if (sum % 10 != check) {
            throw new IllegalArgumentException("casNumber '" + cas + "' has check digit " + check
                    + " but its digits give " + (sum % 10));
        }
    }
}
