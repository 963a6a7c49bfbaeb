package org.tracegas.qa.campaign.internal;

import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;

import org.tracegas.pipeline.MeasurementRole;
import org.tracegas.qa.checks.AbsorbanceRegion;
import org.tracegas.qa.checks.CheckOutcome;
import org.tracegas.qa.checks.NoiseCheck;
import org.tracegas.qa.checks.QaCheck;
import org.tracegas.qa.checks.QaInputs;
import org.tracegas.qa.checks.QaReading;
import org.tracegas.qa.checks.QaSettings;
import org.tracegas.qa.checks.ZeroSpanCheck;
import org.tracegas.spectrum.Spectrum;

/** On each zero-gas reading: every analyte of the plan near zero, and the noise level of the spectrum. */
public final class ZeroGasQaCheck implements QaCheck {

    @Override
    public String name() {
        return "zero-gas";
    }

    @Override
    public Set<String> readings() {
        return Set.of(MeasurementRole.ZERO);
    }

    @Override
    public List<CheckOutcome> evaluate(QaInputs inputs) throws IOException {
        QaSettings s = inputs.settings();
        List<String> analytes = s.words("analytes");
        double[] region = s.range("noise-region");
        NoiseCheck noise = new NoiseCheck(new AbsorbanceRegion(region[0], region[1]), s.number("maximum-noise"));
        List<CheckOutcome> outcomes = new ArrayList<>();
        for (QaReading zero : inputs.readings(MeasurementRole.ZERO)) {
            for (String analyte : analytes) {
                // a zero reading within twice the 3-sigma detection limit passes (common practice, no source)
                double dl = zero.detectionLimit(analyte);
                outcomes.add(new ZeroSpanCheck(Math.max(2 * dl, 1e-9), 5.0).zero(analyte, zero.ppm(analyte)));
            }
            Spectrum a = zero.absorbance();
            outcomes.add(noise.evaluate(a.axis().toArray(), a.toArray()));
        }
        return outcomes;
    }
}
