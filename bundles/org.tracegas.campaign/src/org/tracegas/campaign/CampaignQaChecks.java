package org.tracegas.campaign;

import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import org.tracegas.preprocess.Background;
import org.tracegas.qa.checks.AbsorbanceRegion;
import org.tracegas.qa.checks.BackgroundAgeCheck;
import org.tracegas.qa.checks.CheckOutcome;
import org.tracegas.qa.checks.CtsBand;
import org.tracegas.qa.checks.CtsDriftCheck;
import org.tracegas.qa.checks.MethodDetectionLimit;
import org.tracegas.qa.checks.NoiseCheck;
import org.tracegas.qa.checks.PathLengthCheck;
import org.tracegas.qa.checks.SpikeGas;
import org.tracegas.qa.checks.SpikeRecoveryCheck;
import org.tracegas.qa.checks.SpikedSample;
import org.tracegas.qa.checks.ZeroSpanCheck;
import org.tracegas.quantify.CompoundResult;
import org.tracegas.spectrum.Spectrum;

/**
 * The QA checks of a campaign from its QA measurements: path length from the calibration transfer standard
 * before and after, its drift, spike recovery with a tracer, zero, noise, the method detection limit and minimum
 * analyte uncertainty of each zero-gas analyte from the replicate zero readings, and background age.
 */
public final class CampaignQaChecks {

    /** What the campaign's QA measurements were made with. */
    public record Plan(String ctsCompound, double ctsPpm, double ctsLow, double ctsHigh, Spectrum ctsReference,
            double ctsReferencePpmMetres, double referenceTemperatureK, double referencePressureKPa,
            double nominalPathM, String spikeAnalyte, String tracer, SpikeGas spikeGas, List<String> analytes,
            AbsorbanceRegion noiseRegion, double maximumNoise, Duration backgroundAgeLimit) {
    }

    private CampaignQaChecks() {
    }

    public static List<CheckOutcome> evaluate(Plan plan, QaMeasurements qa, List<Background> backgrounds,
            Instant firstSample, Instant lastSample) {
        List<CheckOutcome> outcomes = new ArrayList<>();
        List<QaMeasurements.Fitted> cts = qa.withRole(MeasurementRole.CTS);
        PathLengthCheck pathCheck = new PathLengthCheck(plan.nominalPathM(),
                PathLengthCheck.COMMON_PRACTICE_TOLERANCE_PERCENT);
        CtsBand reference = referenceBand(plan);
        List<Double> paths = new ArrayList<>();
        for (QaMeasurements.Fitted f : cts) {
            CtsBand measured = measuredBand(plan, f.measured());
            outcomes.add(pathCheck.evaluate(measured, reference, plan.nominalPathM()));
            paths.add(PathLengthCheck.effectivePath(measured, reference, plan.nominalPathM()));
        }
        if (paths.size() >= 2) {
            outcomes.add(new CtsDriftCheck(CtsDriftCheck.METHOD_320_TOLERANCE_PERCENT).evaluate(paths.get(0),
                    paths.get(paths.size() - 1)));
        }
        List<SpikedSample> spiked = new ArrayList<>();
        for (Map.Entry<QaMeasurements.Fitted, QaMeasurements.Fitted> pair : qa.spikePairs(MeasurementRole.SPIKE, MeasurementRole.UNSPIKED)) {
            spiked.add(new SpikedSample(pair.getKey().ppm(plan.tracer()), pair.getKey().ppm(plan.spikeAnalyte()),
                    pair.getValue().ppm(plan.spikeAnalyte())));
        }
        if (!spiked.isEmpty()) {
            SpikeGas gas = spikeGas(plan, qa.withRole(MeasurementRole.SPIKE_DIRECT));
            SpikeRecoveryCheck check = new SpikeRecoveryCheck(SpikeRecoveryCheck.METHOD_320_LIMITS);
            outcomes.add(check.dilution(plan.spikeAnalyte(), gas, spiked));
            outcomes.add(check.evaluate(plan.spikeAnalyte(), gas, spiked));
        }
        List<QaMeasurements.Fitted> zeros = qa.withRole(MeasurementRole.ZERO);
        for (QaMeasurements.Fitted zero : zeros) {
            for (String analyte : plan.analytes()) {
                // a zero reading within twice the 3-sigma detection limit passes (common practice, no source)
                double dl = zero.result().compound(analyte).orElseThrow().detectionLimit();
                outcomes.add(new ZeroSpanCheck(Math.max(2 * dl, 1e-9), 5.0).zero(analyte, zero.ppm(analyte)));
            }
            Spectrum a = zero.measured().ratio().spectrum();
            outcomes.add(new NoiseCheck(plan.noiseRegion(), plan.maximumNoise()).evaluate(a.axis().toArray(),
                    a.toArray()));
        }
        if (zeros.size() >= 2) {
            for (String analyte : plan.analytes()) {
                outcomes.addAll(methodDetectionLimit(analyte, zeros).outcomes());
            }
        }
        outcomes.add(worstBackgroundAge(plan.backgroundAgeLimit(), backgrounds, firstSample, lastSample));
        return outcomes;
    }

    /** The effective path of each CTS reading, in the order given (EPA Method 320 section 10.2). */
    static List<Double> ctsPaths(Plan plan, List<MeasuredSpectrum> cts) {
        CtsBand reference = referenceBand(plan);
        return cts.stream().map(m -> PathLengthCheck.effectivePath(measuredBand(plan, m), reference,
                plan.nominalPathM())).toList();
    }

    private static CtsBand referenceBand(Plan plan) {
        return new CtsBand(BandArea.of(plan.ctsReference(), plan.ctsLow(), plan.ctsHigh()),
                plan.ctsReferencePpmMetres() / plan.nominalPathM(), plan.referenceTemperatureK(),
                plan.referencePressureKPa());
    }

    private static CtsBand measuredBand(Plan plan, MeasuredSpectrum m) {
        return new CtsBand(BandArea.of(m.ratio().spectrum(), plan.ctsLow(), plan.ctsHigh()), plan.ctsPpm(),
                m.cellTemperatureK(), m.cellPressureKPa());
    }

    /** The MDL and MAU of an analyte from the replicate zero-gas readings, each fitted as a sample is. */
    private static MethodDetectionLimit methodDetectionLimit(String analyte, List<QaMeasurements.Fitted> zeros) {
        double[] ppm = new double[zeros.size()];
        double[] u = new double[zeros.size()];
        for (int i = 0; i < ppm.length; i++) {
            CompoundResult c = zeros.get(i).result().compound(analyte).orElseThrow();
            ppm[i] = c.concentration();
            u[i] = c.standardUncertainty();
        }
        return MethodDetectionLimit.fromZeroReadings(analyte, ppm, u);
    }

    /**
     * The spike gas as measured directly when the campaign holds such readings (mean of them), else the cylinder
     * contents of the plan, each saying which it is.
     */
    private static SpikeGas spikeGas(Plan plan, List<QaMeasurements.Fitted> direct) {
        if (direct.isEmpty()) {
            return plan.spikeGas();
        }
        double tracer = direct.stream().mapToDouble(f -> f.ppm(plan.tracer())).average().orElseThrow();
        double analyte = direct.stream().mapToDouble(f -> f.ppm(plan.spikeAnalyte())).average().orElseThrow();
        return new SpikeGas(tracer, analyte, "direct reading of the spike gas, mean of " + direct.size());
    }

    /** The oldest background any sample of the run was ratioed against: at the last sample before a new one. */
    private static CheckOutcome worstBackgroundAge(Duration limit, List<Background> backgrounds, Instant first,
            Instant last) {
        BackgroundTimeline timeline = new BackgroundTimeline(backgrounds);
        Instant worstSample = last;
        Background worst = timeline.latestBefore(last);
        for (Background b : timeline.all()) {
            if (b.measured().isAfter(first) && b.measured().isBefore(last)) {
                Instant justBefore = b.measured().minusNanos(1);
                Background previous = timeline.latestBefore(justBefore);
                if (Duration.between(previous.measured(), justBefore)
                        .compareTo(Duration.between(worst.measured(), worstSample)) > 0) {
                    worst = previous;
                    worstSample = justBefore;
                }
            }
        }
        return new BackgroundAgeCheck(limit).evaluate(worst.measured(), worstSample);
    }
}
