package org.tracegas.qa.basis;

/**
 * How a value below its detection limit enters an average; the report states the convention used. Which one a
 * campaign uses is for its test plan to state (common practice, no source).
 */
public enum DetectionLimitConvention {
    /** The value as measured, negative or not: unbiased, what an average of noise around zero should get. */
    AS_MEASURED("values below the detection limit are averaged as measured"),
    /** 0: a lower bound of the average. */
    ZERO("values below the detection limit count as 0 (lower bound)"),
    /** Half the detection limit. */
    HALF_LIMIT("values below the detection limit count as half the limit"),
    /** The detection limit: an upper bound of the average. */
    LIMIT("values below the detection limit count as the limit (upper bound)");

    private final String statement;

    DetectionLimitConvention(String statement) {
        this.statement = statement;
    }

    /** The convention in words, for the report. */
    public String statement() {
        return statement;
    }

    /** The value that enters the average for a measured value and its detection limit (0: none applies). */
    public double apply(double value, double detectionLimit) {
        if (!(detectionLimit > 0) || value >= detectionLimit) {
            return value;
        }
        switch (this) {
            case ZERO:
                return 0.0;
            case HALF_LIMIT:
                return 0.5 * detectionLimit;
            case LIMIT:
                return detectionLimit;
            default:
                return value;
        }
    }
}
