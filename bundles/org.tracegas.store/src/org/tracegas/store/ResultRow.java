package org.tracegas.store;

import java.time.Instant;

/**
 * A stored result with what it needs to stand alone in an export.
 *
 * @param result       the result with its versions, flags and input hash
 * @param measured     when its measurement was measured; null for a result of no measurement
 * @param sourceFile   the name of the imported file its measurement came from; null when it came from none
 * @param recipeSha256 SHA-256 of the processing recipe that ran; null when none was recorded
 */
public record ResultRow(ResultInfo result, Instant measured, String sourceFile, String recipeSha256) {
}
