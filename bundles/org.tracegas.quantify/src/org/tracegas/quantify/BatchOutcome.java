package org.tracegas.quantify;

/**
 * How a batch ended.
 *
 * @param delivered results handed to the consumer, always the first {@code delivered} samples in input order
 * @param cancelled whether the batch stopped on its cancellation flag
 */
public record BatchOutcome(long delivered, boolean cancelled) {
}
