package org.tracegas.store;

import java.time.Instant;

/** A stored QA check: its outcome, the method version it was made with, who recorded it and when. */
public record QaCheckInfo(String id, String projectId, String methodVersionId, NewQaCheck outcome,
        String recordedBy, Instant recorded) {
}
