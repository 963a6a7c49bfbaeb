package org.tracegas.campaign;

import java.io.IOException;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

import org.tracegas.library.ReferenceLibrary;
import org.tracegas.library.ReferenceSpectrum;
import org.tracegas.library.io.FileFormatException;
import org.tracegas.library.io.LibraryVersionText;
import org.tracegas.preprocess.BackgroundRatio;
import org.tracegas.preprocess.InterferogramTransform;
import org.tracegas.qa.checks.CheckOutcome;
import org.tracegas.store.MeasurementInfo;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;

/**
 * Evaluates a campaign's QA checks once per method version and stores them: the QA measurements are transformed
 * and fitted with the stored method, the CTS reference comes from the method's own library version, and the
 * background ages span the project's stored samples. The repeated readings the plan charts are judged on their
 * control charts against the earlier campaigns of the same method, and the charts' outcomes are stored with the
 * other checks. Checks stored already are returned as they are.
 */
public final class QaEvaluation {

    /** The checks, and whether they were stored before this evaluation. */
    public record Outcome(List<CheckOutcome> checks, boolean reused) {
    }

    private final WorkspaceStore store;
    private final Session actor;
    private final String projectId;
    private final String software;

    public QaEvaluation(WorkspaceStore store, Session actor, String projectId, String software) {
        this.store = store;
        this.actor = actor;
        this.projectId = projectId;
        this.software = software;
    }

    /**
     * @param qa the QA file's contents: its backgrounds and its QA measurements (role in the header)
     * @throws FileFormatException if the plan's library folder is not the library version the method was made
     *                             with, or lacks the CTS compound
     */
    public Outcome run(String methodVersionId, StoredMethod method, QaPlan plan, ContainerContents qa)
            throws IOException {
        store.audit().verifyWorkspace(List.of()).requireIntact("evaluate the QA checks of project " + projectId);
        List<CheckOutcome> stored = StoredQaChecks.load(store, actor, projectId, methodVersionId);
        if (!stored.isEmpty()) {
            return new Outcome(stored, true);
        }
        List<MeasurementInfo> samples = store.projects().measurements(actor, projectId);
        if (samples.isEmpty()) {
            throw new IllegalStateException("the project holds no processed samples yet; quantify them first");
        }
        ReferenceLibrary library = methodLibrary(store, plan, method);
        List<MeasuredSpectrum> measured = measured(plan, method, qa);
        QaMeasurements fitted = QaMeasurements.fit(measured,
                method.quantifier(qa.backgrounds().get(0).singleBeam().axis(), software, false));
        Instant first = samples.get(0).time();
        Instant last = samples.get(samples.size() - 1).time();
        List<CheckOutcome> readings = CampaignQaChecks.evaluate(checksPlan(plan, library, method), fitted,
                qa.backgrounds(), first, last);
        List<CheckOutcome> checks = new ArrayList<>(readings);
        List<CheckOutcome> history = plan.charts().isEmpty() ? List.of()
                : StoredQaChecks.history(store, actor, projectId, method.method().name());
        for (QaControlCharts charts : plan.charts()) {
            charts.evaluate(history, readings).forEach(e -> checks.add(e.outcome()));
        }
        StoredQaChecks.store(store, actor, projectId, methodVersionId, checks);
        return new Outcome(StoredQaChecks.load(store, actor, projectId, methodVersionId), false);
    }

    /**
     * The plan's library, which must be the library version the method was made with.
     *
     * @throws FileFormatException if it is another
     */
    static ReferenceLibrary methodLibrary(WorkspaceStore store, QaPlan plan, StoredMethod method)
            throws IOException {
        if (!LibraryVersionText.of(plan.libraryManifest())
                .equals(store.versions().content(method.libraryVersionId()))) {
            throw new FileFormatException(plan.file(), 0, "library", plan.libraryManifest()
                    + " is not the library version " + method.libraryVersionId() + " the method was made with");
        }
        return LabReferenceSource.manifestReader().read(plan.libraryManifest());
    }

    /** The QA measurements through the method's transform and the ratio against the QA file's backgrounds. */
    static List<MeasuredSpectrum> measured(QaPlan plan, StoredMethod method, ContainerContents qa) {
        SpectrumChain chain = new SpectrumChain(new InterferogramTransform(method.transform()),
                new BackgroundRatio(plan.backgroundAgeLimit()), new BackgroundTimeline(qa.backgrounds()));
        return qa.others().stream().map(chain::process).toList();
    }

    /** The CTS reference nearest in amount to the CTS gas in the cell, so that saturation does not bias the ratio. */
    static CampaignQaChecks.Plan checksPlan(QaPlan plan, ReferenceLibrary library, StoredMethod method)
            throws FileFormatException {
        double path = method.method().pathLengthMetres();
        double ctsPpmMetres = plan.ctsPpm() * path;
        ReferenceSpectrum cts = library.references().stream()
                .filter(r -> r.compound().name().equals(plan.ctsCompound()))
                .min(Comparator.comparingDouble(
                        r -> Math.abs(r.metadata().conditions().concentrationPathLength() - ctsPpmMetres)))
                .orElseThrow(() -> new FileFormatException(plan.file(), 0, "cts-compound", "the library has no "
                        + "reference of " + plan.ctsCompound()));
        return new CampaignQaChecks.Plan(plan.ctsCompound(), plan.ctsPpm(), plan.ctsLow(), plan.ctsHigh(),
                cts.spectrum(), cts.metadata().conditions().concentrationPathLength(),
                cts.metadata().conditions().temperature(), cts.metadata().conditions().pressure(), path,
                plan.spikeAnalyte(), plan.tracer(), plan.spikeGas(), plan.analytes(), plan.noiseRegion(),
                plan.maximumNoise(), plan.backgroundAgeLimit());
    }
}
