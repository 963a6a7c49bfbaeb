package org.tracegas.qa.checks;

import org.tracegas.qa.internal.Require;

/**
 * A human-readable acceptance rule and where it comes from (a standard and section, or "common practice,
 * no source" for trade practice without a written figure).
 */
public record Rule(String statement, String source) {

    public Rule {
        Require.text("statement", statement);
        Require.text("source", source);
    }
}
