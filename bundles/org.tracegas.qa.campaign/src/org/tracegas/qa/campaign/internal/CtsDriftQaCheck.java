package org.tracegas.qa.campaign.internal;

import java.io.IOException;
import java.util.List;
import java.util.Set;

import org.tracegas.pipeline.MeasurementRole;
import org.tracegas.qa.checks.CheckOutcome;
import org.tracegas.qa.checks.CtsDriftCheck;
import org.tracegas.qa.checks.PathLengthCheck;
import org.tracegas.qa.checks.QaCheck;
import org.tracegas.qa.checks.QaInputs;
import org.tracegas.qa.checks.QaReading;

/** The drift of the path length between the first and the last reading of the calibration transfer standard. */
public final class CtsDriftQaCheck implements QaCheck {

    @Override
    public String name() {
        return "cts-drift";
    }

    @Override
    public Set<String> readings() {
        return Set.of(MeasurementRole.CTS);
    }

    @Override
    public List<CheckOutcome> evaluate(QaInputs inputs) throws IOException {
        List<QaReading> cts = inputs.readings(MeasurementRole.CTS);
        if (cts.size() < 2) {
            return List.of();
        }
        CtsBands bands = new CtsBands(inputs);
        double path = inputs.nominalPathMetres();
        double first = PathLengthCheck.effectivePath(bands.measured(cts.get(0)), bands.reference(), path);
        double last = PathLengthCheck.effectivePath(bands.measured(cts.get(cts.size() - 1)), bands.reference(), path);
        return List.of(new CtsDriftCheck(CtsDriftCheck.METHOD_320_TOLERANCE_PERCENT).evaluate(first, last));
    }
}
