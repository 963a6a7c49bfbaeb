package org.tracegas.qa.campaign;

import java.io.IOException;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;

import org.tracegas.importer.ImportException;
import org.tracegas.library.ReferenceLibrary;
import org.tracegas.library.io.FileFormatException;
import org.tracegas.library.io.LibraryVersionText;
import org.tracegas.method.LabReferenceSource;
import org.tracegas.method.StoredMethod;
import org.tracegas.pipeline.BackgroundTimeline;
import org.tracegas.pipeline.ContainerContents;
import org.tracegas.pipeline.MeasuredSpectrum;
import org.tracegas.pipeline.MeasurementQuantification;
import org.tracegas.pipeline.MeasurementRole;
import org.tracegas.pipeline.QaMeasurements;
import org.tracegas.pipeline.QuantificationSetup;
import org.tracegas.pipeline.ResultCorrection;
import org.tracegas.pipeline.SpectrumChain;
import org.tracegas.model.Measurement;
import org.tracegas.preprocess.Background;
import org.tracegas.preprocess.BackgroundRatio;
import org.tracegas.preprocess.InterferogramTransform;
import org.tracegas.qa.basis.PathOrigin;
import org.tracegas.qa.checks.CheckOutcome;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;

/**
 * Evaluates a campaign's QA checks once per method version and stores them: the QA measurements (of a QA
 * container file, or imported from the lab's files) are made absorbance and fitted with the stored method, the
 * CTS reference comes from the method's own library version, and the background ages span the project's stored
 * samples. The QA readings' amounts are corrected to their cell as the method's results are (to the path of the
 * CTS readings for a method that takes its path from them), so that the checks, the detection limits among them,
 * are on the basis of the results they vouch for. The repeated readings the plan charts are judged on their
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

    /** The QA measurements fitted with the method: made only when the checks are not stored yet. */
    @FunctionalInterface
    private interface Readings<E extends Exception> {
        QaMeasurements fit() throws E;
    }

    /**
     * @param qa the QA file's contents: its backgrounds and its QA measurements (role in the header)
     * @throws FileFormatException if the plan's library folder is not the library version the method was made
     *                             with, or lacks the CTS compound
     */
    public Outcome run(String methodVersionId, StoredMethod method, QaPlan plan, ContainerContents qa)
            throws IOException {
        return run(methodVersionId, method, plan, () -> QaMeasurements.fit(measured(plan, method, qa),
                method.quantifier(qa.backgrounds().get(0).singleBeam().axis(), software, false)),
                qa.backgrounds());
    }

    /**
     * Evaluates the checks on the QA measurements the project holds from the lab's files (those whose labels
     * state a QA role), made absorbance, put through the method's recipe and fitted as quantify treats its
     * samples, with the project's backgrounds.
     *
     * @param imports the quantification of the project with the method version the checks are for
     * @throws ImportException     naming the file, record and field of a QA measurement that cannot be fitted
     * @throws FileFormatException as {@link #run(String, StoredMethod, QaPlan, ContainerContents)}
     */
    public Outcome run(String methodVersionId, StoredMethod method, QaPlan plan, MeasurementQuantification imports)
            throws IOException, ImportException {
        imports.plan();
        return run(methodVersionId, method, plan, () -> {
            QaMeasurements fitted = imports.qaMeasurements();
            if (fitted.isEmpty()) {
                throw new IllegalStateException("the project holds no QA measurements; import the lab's QA files,"
                        + " each record stating its role (label " + MeasurementRole.KEY + ", in JCAMP-DX ##$ROLE=)");
            }
            return fitted;
        }, imports.backgrounds());
    }

    private <E extends Exception> Outcome run(String methodVersionId, StoredMethod method, QaPlan plan,
            Readings<E> qa, List<Background> backgrounds) throws IOException, E {
        store.audit().verifyWorkspace(List.of()).requireIntact("evaluate the QA checks of project " + projectId);
        List<CheckOutcome> stored = StoredQaChecks.load(store, actor, projectId, methodVersionId);
        if (!stored.isEmpty()) {
            return new Outcome(stored, true);
        }
        List<Measurement> samples = store.projects().measurements(actor, projectId);
        if (samples.isEmpty()) {
            throw new IllegalStateException("the project holds no processed samples yet; quantify them first");
        }
        ReferenceLibrary library = methodLibrary(store, plan, method);
        QaMeasurements fitted = qa.fit();
        Instant first = samples.get(0).getTime();
        Instant last = samples.get(samples.size() - 1).getTime();
        // the readings' amounts on the basis of the results: corrected to their cell, and to the path the CTS
        // readings measured for a method that takes its path from them
        ResultCorrection correction = ResultCorrection.of(method);
        if (method.pathSource() == PathOrigin.CTS_DERIVED) {
            correction = correction.withCtsPath(CtsPath.mean(store, plan, method, fitted, backgrounds));
        }
        List<CheckOutcome> readings = CampaignQaChecks.evaluate(plan.checks(), new PlanInputs(plan, fitted,
                backgrounds, first, last, method.method().pathLengthMetres(), library, correction));
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
        QuantificationSetup.requireNoRecipeSteps(method);
        SpectrumChain chain = new SpectrumChain(new InterferogramTransform(method.transform()),
                new BackgroundRatio(plan.backgroundAgeLimit()), new BackgroundTimeline(qa.backgrounds()));
        return qa.others().stream().map(chain::process).toList();
    }
}
