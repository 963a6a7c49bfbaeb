package org.tracegas.pipeline;

import java.util.EnumSet;
import java.util.Set;

import org.tracegas.model.ResultFlag;
import org.tracegas.quantify.QualityFlag;

/** The fit's quality flags as the workspace model stores them. */
final class FlagMapping {

    private FlagMapping() {
    }

    static Set<ResultFlag> toStored(Set<QualityFlag> flags) {
        Set<ResultFlag> stored = EnumSet.noneOf(ResultFlag.class);
        for (QualityFlag f : flags) {
            stored.add(switch (f) {
                case OUTSIDE_CALIBRATED_RANGE -> ResultFlag.ABOVE_CALIBRATED_RANGE;
                case RESIDUAL_ABOVE_LIMIT -> ResultFlag.HIGH_RESIDUAL;
                case NEGATIVE_BEYOND_DETECTION_LIMIT -> ResultFlag.NEGATIVE_BEYOND_DETECTION_LIMIT;
                case ABSORBANCE_TOO_HIGH -> ResultFlag.SATURATED;
                case BACKGROUND_TOO_OLD -> ResultFlag.BACKGROUND_TOO_OLD;
                case NOT_CONVERGED -> ResultFlag.NOT_CONVERGED;
                // the stored model has no flag of its own for a fit that left out unusable spectrum points
                case POINTS_MASKED -> ResultFlag.QA_FAILED;
            });
        }
        return stored;
    }
}
