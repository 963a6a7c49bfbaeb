package org.tracegas.qa.campaign;

import java.io.IOException;
import java.time.Instant;
import java.util.Comparator;
import java.util.List;

import org.tracegas.library.ReferenceLibrary;
import org.tracegas.library.ReferenceSpectrum;
import org.tracegas.library.io.FileFormatException;
import org.tracegas.pipeline.BackgroundTimeline;
import org.tracegas.pipeline.QaMeasurements;
import org.tracegas.preprocess.Background;
import org.tracegas.qa.checks.QaInputs;
import org.tracegas.qa.checks.QaReading;
import org.tracegas.qa.checks.QaReference;
import org.tracegas.qa.checks.QaSettings;
import org.tracegas.spectrum.Spectrum;
import org.tracegas.pipeline.ResultCorrection;

/**
 * A campaign's QA readings, backgrounds (none for spectra imported as absorbance), sample span, method path and
 * library, as its QA plan's checks see them. The amounts of each reading are corrected to its cell as the
 * method's results are ({@link ResultCorrection}), so that a check judges, and a detection limit is stated on,
 * the basis the campaign's results are reported on; the absorbance and the cell stay as measured.
 */
final class PlanInputs implements QaInputs {

    private final QaPlan plan;
    private final QaMeasurements readings;
    private final BackgroundTimeline backgrounds;
    private final Instant firstSample;
    private final Instant lastSample;
    private final double nominalPathMetres;
    private final ReferenceLibrary library;
    private final ResultCorrection correction;

    /** @param correction of the method's results; {@link ResultCorrection#none()} leaves the amounts as fitted */
    PlanInputs(QaPlan plan, QaMeasurements readings, List<Background> backgrounds, Instant firstSample,
            Instant lastSample, double nominalPathMetres, ReferenceLibrary library, ResultCorrection correction) {
        this.plan = plan;
        this.readings = readings;
        this.backgrounds = backgrounds.isEmpty() ? null : new BackgroundTimeline(backgrounds);
        this.firstSample = firstSample;
        this.lastSample = lastSample;
        this.nominalPathMetres = nominalPathMetres;
        this.library = library;
        this.correction = correction;
    }

    @Override
    public List<QaReading> readings(String role) {
        return readings.withRole(role).stream().<QaReading>map(f -> new Corrected(f, correction)).toList();
    }

    @Override
    public List<Instant> backgrounds() {
        return backgrounds == null ? List.of() : backgrounds.all().stream().map(Background::measured).toList();
    }

    @Override
    public Instant backgroundBefore(Instant time) {
        if (backgrounds == null) {
            throw new IllegalArgumentException("the project holds no background");
        }
        return backgrounds.latestBefore(time).measured();
    }

    @Override
    public Instant firstSample() {
        return firstSample;
    }

    @Override
    public Instant lastSample() {
        return lastSample;
    }

    @Override
    public double nominalPathMetres() {
        return nominalPathMetres;
    }

    @Override
    public QaSettings settings() {
        return plan.settings();
    }

    @Override
    public QaReference reference(String compound, double ppmMetres) throws IOException {
        ReferenceSpectrum r = library.references().stream().filter(x -> x.compound().name().equals(compound))
                .min(Comparator.comparingDouble(
                        x -> Math.abs(x.metadata().conditions().concentrationPathLength() - ppmMetres)))
                .orElseThrow(() -> new FileFormatException(plan.file(), 0, "cts-compound", "the library has no "
                        + "reference of " + compound));
        return new QaReference(r.spectrum(), r.metadata().conditions().concentrationPathLength(),
                r.metadata().conditions().temperature(), r.metadata().conditions().pressure());
    }

    /** A reading whose amounts are scaled by the factor the method's results get in the reading's cell. */
    private record Corrected(QaReading fitted, ResultCorrection correction) implements QaReading {

        @Override
        public Instant time() {
            return fitted.time();
        }

        @Override
        public String role() {
            return fitted.role();
        }

        @Override
        public Spectrum absorbance() {
            return fitted.absorbance();
        }

        @Override
        public double cellTemperatureK() {
            return fitted.cellTemperatureK();
        }

        @Override
        public double cellPressureKPa() {
            return fitted.cellPressureKPa();
        }

        @Override
        public double ppm(String compound) {
            return fitted.ppm(compound) * factor(compound);
        }

        @Override
        public double detectionLimit(String compound) {
            return fitted.detectionLimit(compound) * factor(compound);
        }

        @Override
        public double standardUncertainty(String compound) {
            return fitted.standardUncertainty(compound) * factor(compound);
        }

        private double factor(String compound) {
            return correction.factor(compound, fitted.cellTemperatureK(), fitted.cellPressureKPa());
        }
    }
}
