package org.tracegas.store;

import java.time.Instant;

/**
 * A stored result.
 *
 * @param recordedBy the user who recorded it
 */
public record ResultInfo(String id, String projectId, NewResult values, String recordedBy, Instant recorded) {
}
