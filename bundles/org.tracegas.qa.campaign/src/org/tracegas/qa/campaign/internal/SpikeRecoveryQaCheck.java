package org.tracegas.qa.campaign.internal;

import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;

import org.tracegas.pipeline.MeasurementRole;
import org.tracegas.qa.checks.CheckOutcome;
import org.tracegas.qa.checks.QaCheck;
import org.tracegas.qa.checks.QaInputs;
import org.tracegas.qa.checks.QaReading;
import org.tracegas.qa.checks.QaSettings;
import org.tracegas.qa.checks.SpikeGas;
import org.tracegas.qa.checks.SpikeRecoveryCheck;
import org.tracegas.qa.checks.SpikedSample;

/**
 * Spike recovery with a tracer: each spiked reading against the unspiked one taken just before it, the dilution
 * and the recovery of the analyte.
 */
public final class SpikeRecoveryQaCheck implements QaCheck {

    @Override
    public String name() {
        return "spike-recovery";
    }

    @Override
    public Set<String> readings() {
        return Set.of(MeasurementRole.SPIKE, MeasurementRole.UNSPIKED, MeasurementRole.SPIKE_DIRECT);
    }

    @Override
    public List<CheckOutcome> evaluate(QaInputs inputs) throws IOException {
        QaSettings s = inputs.settings();
        String analyte = s.text("spike-analyte");
        String tracer = s.text("tracer");
        List<SpikedSample> spiked = new ArrayList<>();
        List<QaReading> natives = inputs.readings(MeasurementRole.UNSPIKED);
        for (QaReading spike : inputs.readings(MeasurementRole.SPIKE)) {
            QaReading before = unspikedBefore(spike, natives);
            spiked.add(new SpikedSample(spike.ppm(tracer), spike.ppm(analyte), before.ppm(analyte)));
        }
        if (spiked.isEmpty()) {
            return List.of();
        }
        SpikeGas gas = spikeGas(s, analyte, tracer, inputs.readings(MeasurementRole.SPIKE_DIRECT));
        SpikeRecoveryCheck check = new SpikeRecoveryCheck(SpikeRecoveryCheck.METHOD_320_LIMITS);
        return List.of(check.dilution(analyte, gas, spiked), check.evaluate(analyte, gas, spiked));
    }

    /** The unspiked reading taken just before a spiked one, for the native analyte level. */
    private static QaReading unspikedBefore(QaReading spike, List<QaReading> natives) {
        QaReading before = null;
        for (QaReading n : natives) {
            if (n.time().isBefore(spike.time())) {
                before = n;
            }
        }
        if (before == null) {
            throw new IllegalArgumentException("spiked measurement at " + spike.time()
                    + " has no unspiked measurement before it");
        }
        return before;
    }

    /**
     * The spike gas as measured directly when the campaign holds such readings (mean of them), else the cylinder
     * contents of the plan, each saying which it is.
     */
    private static SpikeGas spikeGas(QaSettings s, String analyte, String tracer, List<QaReading> direct)
            throws IOException {
        if (direct.isEmpty()) {
            return new SpikeGas(s.number("spike-tracer-ppm"), s.number("spike-analyte-ppm"));
        }
        double t = direct.stream().mapToDouble(f -> f.ppm(tracer)).average().orElseThrow();
        double a = direct.stream().mapToDouble(f -> f.ppm(analyte)).average().orElseThrow();
        return new SpikeGas(t, a, "direct reading of the spike gas, mean of " + direct.size());
    }
}
