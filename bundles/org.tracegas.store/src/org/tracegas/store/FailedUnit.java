package org.tracegas.store;

/**
 * A work unit whose payload could not be processed.
 *
 * @param seq     the unit's number in its batch
 * @param payload what the unit was to process (e.g. a file path)
 * @param error   why processing failed, as the runner reported it
 */
public record FailedUnit(int seq, String payload, String error) {
}
