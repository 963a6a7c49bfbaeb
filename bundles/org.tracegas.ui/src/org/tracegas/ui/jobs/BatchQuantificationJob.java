package org.tracegas.ui.jobs;

import java.util.ArrayList;
import java.util.List;
import java.util.function.Consumer;

import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.IStatus;
import org.eclipse.core.runtime.Status;
import org.eclipse.core.runtime.SubMonitor;
import org.eclipse.core.runtime.jobs.Job;
import org.tracegas.pipeline.AnalysisVersions;
import org.tracegas.pipeline.ProcessedSpectra;
import org.tracegas.quantify.Quantifier;
import org.tracegas.quantify.Sample;
import org.tracegas.quantify.SpectrumResult;
import org.tracegas.spectrum.Spectrum;
import org.tracegas.store.ResultInfo;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;

/**
 * Runs a method over a batch of measurements in the background and records each compound's result in the
 * workspace as the batch path records it ({@link ProcessedSpectra#results}: flags, input hash, versions).
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
    public record Outcome(Item item, SpectrumResult result, List<ResultInfo> recorded) {
        public Outcome {
            recorded = List.copyOf(recorded);
        }
    }

    /** Where results are recorded and under which versions. */
    public record Target(WorkspaceStore store, Session session, String projectId, AnalysisVersions versions) {
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
    private List<ResultInfo> record(Item item, SpectrumResult result) {
        return target.store().results().recordAll(target.session(), target.projectId(),
                ProcessedSpectra.results(result, target.versions()).stream()
                        .map(r -> r.withMeasurement(item.measurementId())).toList());
    }
}
