package org.tracegas.qa.control;

/**
 * A sample that a control chart flags.
 *
 * @param index zero-based sample index
 * @param rule  the rule that fired, in words
 */
public record ControlSignal(int index, String rule) {
}
