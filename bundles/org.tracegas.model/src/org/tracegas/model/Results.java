package org.tracegas.model;

import java.util.Collection;

/** New results made from their values in one call, as the pipeline makes them after a fit. */
public final class Results {

    private Results() {
    }

    /**
     * A new result, not yet stored: without id, project, recording user and time, which the store sets on the
     * copy it records.
     *
     * @param measurementId the measurement analysed, or null (the store assigns the measurement of a processed
     *                      spectrum)
     * @param conditions    what the result was corrected with, or null when it was not corrected
     */
    public static Result of(String measurementId, String compound, double concentration, double standardUncertainty,
            double detectionLimit, String unit, Collection<ResultFlag> flags, Provenance provenance,
            ResultConditions conditions) {
        Result r = WorkspaceFactory.eINSTANCE.createResult();
        r.setMeasurementId(measurementId);
        r.setCompound(compound);
        r.setConcentration(concentration);
        r.setStandardUncertainty(standardUncertainty);
        r.setDetectionLimit(detectionLimit);
        r.setUnit(unit);
        r.getFlags().addAll(flags);
        r.setProvenance(provenance);
        r.setConditions(conditions);
        return r;
    }
}
