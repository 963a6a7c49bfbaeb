package org.tracegas.qa.campaign.internal;

import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;

import org.tracegas.pipeline.MeasurementRole;
import org.tracegas.qa.checks.CheckOutcome;
import org.tracegas.qa.checks.MethodDetectionLimit;
import org.tracegas.qa.checks.QaCheck;
import org.tracegas.qa.checks.QaInputs;
import org.tracegas.qa.checks.QaReading;

/**
 * The method detection limit and minimum analyte uncertainty of each analyte of the plan, from the campaign's
 * replicate zero-gas readings, each quantified through the whole chain as a sample is.
 */
public final class MethodDetectionLimitQaCheck implements QaCheck {

    @Override
    public String name() {
        return "method-detection-limit";
    }

    @Override
    public Set<String> readings() {
        return Set.of(MeasurementRole.ZERO);
    }

    @Override
    public List<CheckOutcome> evaluate(QaInputs inputs) throws IOException {
        List<QaReading> zeros = inputs.readings(MeasurementRole.ZERO);
        List<CheckOutcome> outcomes = new ArrayList<>();
        if (zeros.size() < 2) {
            // a standard deviation needs two readings; fewer than the minimum fail inside MethodDetectionLimit
            return outcomes;
        }
        for (String analyte : inputs.settings().words("analytes")) {
            double[] ppm = new double[zeros.size()];
            double[] u = new double[zeros.size()];
            for (int i = 0; i < ppm.length; i++) {
                ppm[i] = zeros.get(i).ppm(analyte);
                u[i] = zeros.get(i).standardUncertainty(analyte);
            }
            outcomes.addAll(MethodDetectionLimit.fromZeroReadings(analyte, ppm, u).outcomes());
        }
        return outcomes;
    }
}
