package org.tracegas.campaign;

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

    /** A QA measurement and what the method found in it. */
    public record Fitted(MeasuredSpectrum measured, SpectrumResult result) implements QaReading {

        @Override
        public Instant time() {
            return measured.time();
        }

        @Override
        public String role() {
            return measured.role();
        }

        @Override
        public Spectrum absorbance() {
            return measured.ratio().spectrum();
        }

        @Override
        public double cellTemperatureK() {
            return measured.cellTemperatureK();
        }

        @Override
        public double cellPressureKPa() {
            return measured.cellPressureKPa();
        }

        @Override
        public double ppm(String compound) {
            return compound(compound).concentration();
        }

        @Override
        public double detectionLimit(String compound) {
            return compound(compound).detectionLimit();
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
            fitted.add(new Fitted(m, quantifier.quantify(Sample.of(m.ratio().spectrum()))));
        }
        return new QaMeasurements(fitted);
    }

    /** The measurements of one role, in time order. */
    public List<Fitted> withRole(String role) {
        return all.stream().filter(f -> f.measured().role().equals(role))
                .sorted((a, b) -> a.measured().time().compareTo(b.measured().time())).toList();
    }
}
