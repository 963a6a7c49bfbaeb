package org.tracegas.store;

import java.util.List;

import org.tracegas.model.Result;
import org.tracegas.spectrum.Spectrum;

/**
 * The analysis of a stored measurement: the absorbance the fit worked on, the recipe that made it from the
 * measurement's values, and the results.
 *
 * @param measurementId the measurement analysed
 * @param recipe        canonical text of the processing recipe that ran, not blank
 * @param absorbance    the absorbance fitted, stored as {@link org.tracegas.model.SpectralContent#ABSORBANCE}
 * @param encoding      how its values are stored
 * @param results       the results, at least one, each naming this measurement or none; the store records
 *                      them for this measurement
 */
public record MeasurementAnalysis(String measurementId, String recipe, Spectrum absorbance, SampleEncoding encoding,
        List<Result> results) {

    /** @throws IllegalArgumentException naming the field (and result index) that is missing or wrong */
    public MeasurementAnalysis {
        if (measurementId == null || measurementId.isBlank()) {
            throw new IllegalArgumentException("measurementId must not be blank");
        }
        if (recipe == null || recipe.isBlank()) {
            throw new IllegalArgumentException("recipe of measurement " + measurementId + " must not be blank");
        }
        if (absorbance == null || encoding == null) {
            throw new IllegalArgumentException("absorbance and encoding of measurement " + measurementId
                    + " must not be null");
        }
        if (results == null || results.isEmpty()) {
            throw new IllegalArgumentException("results of measurement " + measurementId + " must not be empty");
        }
        for (int i = 0; i < results.size(); i++) {
            Result r = results.get(i);
            ResultChecks.requireComplete(r, "results[" + i + "].");
            if (r.getMeasurementId() != null && !r.getMeasurementId().equals(measurementId)) {
                throw new IllegalArgumentException("results[" + i + "].measurementId is " + r.getMeasurementId()
                        + ", not the measurement analysed, " + measurementId);
            }
        }
        results = List.copyOf(results);
    }
}
