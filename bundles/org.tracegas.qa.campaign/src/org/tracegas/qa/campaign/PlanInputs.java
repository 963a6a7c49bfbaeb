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

/**
 * A campaign's QA readings, backgrounds (none for spectra imported as absorbance), sample span, method path and
 * library, as its QA plan's checks see them.
 */
final class PlanInputs implements QaInputs {

    private final QaPlan plan;
    private final QaMeasurements readings;
    private final BackgroundTimeline backgrounds;
    private final Instant firstSample;
    private final Instant lastSample;
    private final double nominalPathMetres;
    private final ReferenceLibrary library;

    PlanInputs(QaPlan plan, QaMeasurements readings, List<Background> backgrounds, Instant firstSample,
            Instant lastSample, double nominalPathMetres, ReferenceLibrary library) {
        this.plan = plan;
        this.readings = readings;
        this.backgrounds = backgrounds.isEmpty() ? null : new BackgroundTimeline(backgrounds);
        this.firstSample = firstSample;
        this.lastSample = lastSample;
        this.nominalPathMetres = nominalPathMetres;
        this.library = library;
    }

    @Override
    public List<QaReading> readings(String role) {
        return List.copyOf(readings.withRole(role));
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
}
