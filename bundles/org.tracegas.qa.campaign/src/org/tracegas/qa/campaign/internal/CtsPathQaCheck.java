package org.tracegas.qa.campaign.internal;

import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;

import org.tracegas.pipeline.MeasurementRole;
import org.tracegas.qa.checks.CheckOutcome;
import org.tracegas.qa.checks.PathLengthCheck;
import org.tracegas.qa.checks.QaCheck;
import org.tracegas.qa.checks.QaInputs;
import org.tracegas.qa.checks.QaReading;

/** The optical path length from each reading of the calibration transfer standard, against the method's. */
public final class CtsPathQaCheck implements QaCheck {

    @Override
    public String name() {
        return "cts-path";
    }

    @Override
    public Set<String> readings() {
        return Set.of(MeasurementRole.CTS);
    }

    @Override
    public List<CheckOutcome> evaluate(QaInputs inputs) throws IOException {
        CtsBands bands = new CtsBands(inputs);
        double path = inputs.nominalPathMetres();
        PathLengthCheck check = new PathLengthCheck(path, PathLengthCheck.COMMON_PRACTICE_TOLERANCE_PERCENT);
        List<CheckOutcome> outcomes = new ArrayList<>();
        for (QaReading cts : inputs.readings(MeasurementRole.CTS)) {
            outcomes.add(check.evaluate(bands.measured(cts), bands.reference(), path));
        }
        return outcomes;
    }

    /** The effective path of each CTS reading, in time order (EPA Method 320 section 10.2), m. */
    public static List<Double> effectivePaths(QaInputs inputs) throws IOException {
        CtsBands bands = new CtsBands(inputs);
        double path = inputs.nominalPathMetres();
        List<Double> paths = new ArrayList<>();
        for (QaReading cts : inputs.readings(MeasurementRole.CTS)) {
            paths.add(PathLengthCheck.effectivePath(bands.measured(cts), bands.reference(), path));
        }
        return paths;
    }
}
