package org.tracegas.pipeline;

import java.time.Instant;
import java.util.ArrayList;
import java.util.List;

import org.tracegas.qa.checks.QaReading;
import org.tracegas.quantify.CompoundResult;
import org.tracegas.quantify.Quantifier;
import org.tracegas.quantify.Sample;
import org.tracegas.quantify.SpectrumResult;
import org.tracegas.spectrum.Spectrum;

/** The QA measurements of a campaign (CTS, zero, spiked and unspiked pairs), each with its fit. */
public final class QaMeasurements {

    /**
     * A QA measurement and what the method found in it.
     *
     * @param absorbance the absorbance the method fitted
     */
    public record Fitted(Instant time, String role, double cellTemperatureK, double cellPressureKPa,
            Spectrum absorbance, SpectrumResult result) implements QaReading {

        @Override
        public double ppm(String compound) {
            return compound(compound).concentration();
        }

        @Override
        public double detectionLimit(String compound) {
            return compound(compound).detectionLimit();
        }

        @Override
        public double standardUncertainty(String compound) {
            return compound(compound).standardUncertainty();
        }

        private CompoundResult compound(String name) {
            return result.compound(name)
                    .orElseThrow(() -> new IllegalArgumentException("the method does not report " + name));
        }
    }

    private final List<Fitted> all;

    private QaMeasurements(List<Fitted> all) {
        this.all = List.copyOf(all);
    }

    public static QaMeasurements fit(List<MeasuredSpectrum> measured, Quantifier quantifier) {
        List<Fitted> fitted = new ArrayList<>();
        for (MeasuredSpectrum m : measured) {
            Spectrum a = m.ratio().spectrum();
            // the uncertainty widened by the transform's noise factor as a sample's is, so that zero readings
            // judge, and give detection limits for, the uncertainty the samples carry
            fitted.add(new Fitted(m.time(), m.role(), m.cellTemperatureK(), m.cellPressureKPa(), a,
                    quantifier.quantify(new Sample(a, null, ResultCorrection.noiseCorrelation(m.noiseFactor()))
                            .inCell(m.cellTemperatureK(), m.cellPressureKPa()))));
        }
        return new QaMeasurements(fitted);
    }

    /** QA measurements fitted already. */
    public static QaMeasurements of(List<Fitted> fitted) {
        return new QaMeasurements(fitted);
    }

    public boolean isEmpty() {
        return all.isEmpty();
    }

    /** The measurements of one role, in time order. */
    public List<Fitted> withRole(String role) {
        return all.stream().filter(f -> f.role().equals(role)).sorted((a, b) -> a.time().compareTo(b.time()))
                .toList();
    }
}
