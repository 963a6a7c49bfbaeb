package org.tracegas.pipeline.shared;

/**
 * How a worker's run ended.
 *
 * @param completed units this worker completed with their results
 * @param lost      units whose lease this worker lost to another runner; their work was dropped
 * @param failed    units this worker marked failed because their payload could not be processed
 * @param cancelled whether the run stopped on its cancellation flag before the batch was finished
 */
public record WorkerOutcome(int completed, int lost, int failed, boolean cancelled) {
}
