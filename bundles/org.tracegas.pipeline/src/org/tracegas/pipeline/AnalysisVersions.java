package org.tracegas.pipeline;

/** The stored versions of the method and the library that a run uses; every result points at both. */
public record AnalysisVersions(String methodVersionId, String libraryVersionId) {
}
