package org.tracegas.store;

import java.time.Instant;

import org.tracegas.model.Result;

/**
 * A stored result with what it needs to stand alone in an export.
 *
 * @param result       the result with its flags, conditions and provenance
 * @param measured     when its measurement was measured; null for a result of no measurement
 * @param sourceFile   the name of the imported file its measurement came from; null when it came from none
 * @param recipeSha256 SHA-256 of the processing recipe that ran; null when none was recorded
 */
public record ResultRow(Result result, Instant measured, String sourceFile, String recipeSha256) {
}
