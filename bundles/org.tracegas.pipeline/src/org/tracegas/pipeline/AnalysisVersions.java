package org.tracegas.pipeline;

import org.tracegas.model.Provenance;
import org.tracegas.quantify.ReprocessingRecord;

/** The stored versions of the method and the library that a run uses; every result points at both. */
public record AnalysisVersions(String methodVersionId, String libraryVersionId) {

    /**
     * The provenance of a fit's results: these versions with the software and the spectral input the fit
     * recorded. Every result the pipeline stores takes its provenance from here.
     *
     * @throws IllegalArgumentException naming the version or the record's field that is blank or wrong
     */
    public Provenance provenance(ReprocessingRecord record) {
        return new Provenance(methodVersionId, libraryVersionId, record.softwareVersion(), record.inputHash());
    }
}
