/**
 * Quality-assurance checks of an FTIR campaign. Each check returns an immutable {@link
 * org.tracegas.qa.checks.CheckOutcome} that carries the measured value, the acceptance limits and the rule
 * that decided it, with the rule's source.
 */
package org.tracegas.qa.checks;
