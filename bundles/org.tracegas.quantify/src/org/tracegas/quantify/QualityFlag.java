package org.tracegas.quantify;

/** Conditions under which a reported concentration needs a second look. */
public enum QualityFlag {
    /** The fitted amount is above the highest reference of the analyte. */
    OUTSIDE_CALIBRATED_RANGE,
    /** The residual RMS of at least one region is above that region's limit. */
    RESIDUAL_ABOVE_LIMIT,
    /** The concentration is below minus one detection limit: more negative than noise explains. */
    NEGATIVE_BEYOND_DETECTION_LIMIT,
    /** The sample absorbance inside the analyte's windows exceeds the method's highest trusted absorbance. */
    ABSORBANCE_TOO_HIGH,
    /** The background spectrum was older than the caller's limit when the sample was measured. */
    BACKGROUND_TOO_OLD,
    /** The non-linear iteration stopped at its iteration cap before meeting its tolerance. */
    NOT_CONVERGED,
    /** Points of the fit windows where the sample is not finite were left out of the fit. */
    POINTS_MASKED
}
