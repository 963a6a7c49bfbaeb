package org.tracegas.store;

import java.util.Set;

import org.tracegas.model.ResultFlag;

/**
 * A concentration result to record, with exactly what made it.
 *
 * @param measurementId    the measurement analysed, or null
 * @param compound         the compound, not blank
 * @param unit             unit of concentration, uncertainty and detection limit, e.g. "ppm"
 * @param methodVersionId  the method version used; it is frozen by recording the result
 * @param libraryVersionId the library version used; it is frozen by recording the result
 * @param softwareVersion  version of the software that computed the result
 * @param inputHash        SHA-256, hex, of the spectral input
 * @param conditions       what the result was corrected with, or null when it was not corrected
 */
public record NewResult(String measurementId, String compound, double concentration, double uncertainty,
        double detectionLimit, String unit, Set<ResultFlag> flags, String methodVersionId,
        String libraryVersionId, String softwareVersion, String inputHash, ResultConditions conditions) {

    public NewResult {
        requireText("compound", compound);
        requireText("unit", unit);
        requireText("methodVersionId", methodVersionId);
        requireText("libraryVersionId", libraryVersionId);
        requireText("softwareVersion", softwareVersion);
        if (inputHash == null || !inputHash.matches("[0-9a-f]{64}")) {
            throw new IllegalArgumentException("inputHash must be 64 lower-case hex digits (SHA-256), was "
                    + inputHash);
        }
        flags = Set.copyOf(flags);
    }

    /** A result not corrected to the sample cell's conditions. */
    public NewResult(String measurementId, String compound, double concentration, double uncertainty,
            double detectionLimit, String unit, Set<ResultFlag> flags, String methodVersionId,
            String libraryVersionId, String softwareVersion, String inputHash) {
        this(measurementId, compound, concentration, uncertainty, detectionLimit, unit, flags, methodVersionId,
                libraryVersionId, softwareVersion, inputHash, null);
    }

    /** This result for another measurement. */
    public NewResult withMeasurement(String id) {
        return new NewResult(id, compound, concentration, uncertainty, detectionLimit, unit, flags, methodVersionId,
                libraryVersionId, softwareVersion, inputHash, conditions);
    }

    private static void requireText(String field, String value) {
        if (value == null || value.isBlank()) {
            throw new IllegalArgumentException(field + " must not be blank");
        }
    }
}
