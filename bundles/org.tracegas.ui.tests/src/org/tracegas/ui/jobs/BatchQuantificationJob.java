package org.tracegas.ui.jobs;

import java.util.ArrayList;
import java.util.List;
import java.util.function.Consumer;

import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.IStatus;
import org.eclipse.core.runtime.Status;
import org.eclipse.core.runtime.SubMonitor;
import org.eclipse.core.runtime.jobs.Job;
import org.tracegas.model.Result;
import org.tracegas.pipeline.AnalysisVersions;
import org.tracegas.pipeline.ProcessedSpectra;
import org.tracegas.quantify.QuantificationMethod;
import org.tracegas.quantify.Quantifier;
import org.tracegas.quantify.Sample;
import org.tracegas.quantify.SpectrumResult;
import org.tracegas.spectrum.Spectrum;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;
import org.tracegas.ui.parts.FitDisplay;
import org.tracegas.ui.session.SeededProject;
import org.tracegas.ui.session.WorkspaceAccess;

/**
 * The desk tests' way to put results of a {@link SeededProject} into a workspace: runs its method over its
 * in-memory samples in the background and records each compound's result as the batch path records it ({@link ProcessedSpectra#results}: flags, input hash, versions).
 * Cancelling stops after the measurement in hand; what was recorded stays recorded (each measurement's
 * results are one audited transaction).
 */
public final class BatchQuantificationJob extends Job {

    /** Plugin id used in job statuses. */
    static final String PLUGIN = "org.tracegas.ui";

    /** One measurement of the batch. */
    public record Item(String measurementId, String label, Spectrum absorbance) {
    }

    /** What came out for one measurement. */
    public record Outcome(Item item, SpectrumResult result, List<Result> recorded) {
        public Outcome {
            recorded = List.copyOf(recorded);
        }
    }

    /** Where results are recorded and under which versions. */
    public record Target(WorkspaceStore store, Session session, String projectId, AnalysisVersions versions) {
    }

    private static final java.time.format.DateTimeFormatter SHOWN = java.time.format.DateTimeFormatter
            .ofPattern("yyyy-MM-dd HH:mm:ss 'UTC'").withZone(java.time.ZoneOffset.UTC);

    /** A job running the project's method over all its measurements and recording the results. */
    public static BatchQuantificationJob of(WorkspaceAccess access, Session session, SeededProject.Seeded project,
            Consumer<List<Outcome>> whenDone) {
        QuantificationMethod method = project.method().method();
        Quantifier quantifier = project.method().quantifier(project.samples().get(0).axis(), AnalysisRuns.software(),
                true);
        List<Item> items = new ArrayList<>();
        for (int i = 0; i < project.measurementIds().size(); i++) {
            items.add(new Item(project.measurementIds().get(i), method.name() + " — measurement " + (i + 1) + ", "
                    + SHOWN.format(project.measurementTimes().get(i)), project.samples().get(i)));
        }
        return new BatchQuantificationJob("Running " + method.name(), quantifier, items,
                new Target(access.store(), session, project.projectId(),
                        new AnalysisVersions(project.methodVersionId(), project.libraryVersionId())), whenDone);
    }

    /** The fit of one outcome as the spectrum panel shows it. */
    public static FitDisplay fit(Outcome o) {
        return FitDisplay.of(o.item().label(), o.item().absorbance(), o.result().compounds());
    }

    private final Quantifier quantifier;
    private final List<Item> items;
    private final Target target;
    private final Consumer<List<Outcome>> whenDone;
    private volatile List<Outcome> outcomes = List.of();

    /**
     * @param whenDone receives the outcomes (also after cancelling) in the job's thread; UI code must pass
     *                 them on with {@code Display.asyncExec}
     */
    public BatchQuantificationJob(String name, Quantifier quantifier, List<Item> items, Target target,
            Consumer<List<Outcome>> whenDone) {
        super(name);
        this.quantifier = quantifier;
        this.items = List.copyOf(items);
        this.target = target;
        this.whenDone = whenDone;
        setUser(true);
    }

    @Override
    protected IStatus run(IProgressMonitor monitor) {
        SubMonitor progress = SubMonitor.convert(monitor, getName(), items.size());
        List<Outcome> done = new ArrayList<>();
        try {
            for (Item item : items) {
                if (progress.isCanceled()) {
                    return Status.CANCEL_STATUS;
                }
                progress.subTask(item.label());
                SpectrumResult result = quantifier.quantify(Sample.of(item.absorbance()));
                done.add(new Outcome(item, result, record(item, result)));
                progress.worked(1);
            }
            return Status.OK_STATUS;
        } catch (RuntimeException e) {
            return new Status(IStatus.ERROR, PLUGIN, "quantifying " + getName() + " failed: " + e.getMessage(), e);
        } finally {
            outcomes = List.copyOf(done);
            whenDone.accept(outcomes);
        }
    }

    /** Outcomes of the last run so far. */
    public List<Outcome> outcomes() {
        return outcomes;
    }

    /** The results as the batch path stores them (flags, input hash, versions), in one transaction. */
    private List<Result> record(Item item, SpectrumResult result) {
        List<Result> results = ProcessedSpectra.results(result, target.versions());
        results.forEach(r -> r.setMeasurementId(item.measurementId()));
        return target.store().results().recordAll(target.session(), target.projectId(), results);
    }
}
