package org.tracegas.ui.jobs;

import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.function.Consumer;

import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.IStatus;
import org.eclipse.core.runtime.Status;
import org.eclipse.core.runtime.SubMonitor;
import org.eclipse.core.runtime.jobs.Job;
import org.tracegas.importer.ImportException;
import org.tracegas.method.StoredMethod;
import org.tracegas.model.ContentVersion;
import org.tracegas.model.Measurement;
import org.tracegas.model.Project;
import org.tracegas.pipeline.MeasurementQuantification;
import org.tracegas.preprocess.StepRegistry;
import org.tracegas.quantify.CancellationFlag;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;

/**
 * Runs a stored method version over chosen measurements of a project in the background, through the same
 * campaign service as the runner's {@code quantify} command ({@link MeasurementQuantification}): each sample
 * not yet analysed with the version becomes absorbance, goes through the method's recipe and is fitted, and its
 * results are stored with their flags, conditions, recipe and versions, a few measurements per audited
 * transaction. Measurements analysed with the version before are skipped and counted. Every chosen sample is
 * checked before anything is stored; cancelling stops between samples, and what was stored stays.
 */
public final class StoredMethodRunJob extends Job {

    /** What the run did. */
    public record Outcome(int stored, int skipped, boolean cancelled) {
    }

    /** The method version to run and where its results go. */
    public record Target(WorkspaceStore store, Session actor, Project project, ContentVersion version,
            StoredMethod method) {
    }

    private final Target target;
    private final StepRegistry steps;
    private final String software;
    private final Set<String> chosen;
    private final Consumer<Outcome> whenDone;
    private final CancellationFlag cancel = new CancellationFlag();

    /**
     * @param steps    creates the steps of the method's recipe
     * @param software what the results record as their software
     * @param chosen   the measurements to run over (backgrounds among them serve as backgrounds); empty for all
     *                 of the project's
     * @param whenDone receives the outcome (also after cancelling, not after bad input) in the job's thread; UI
     *                 code must pass it on with {@code Display.asyncExec}
     */
    public StoredMethodRunJob(Target target, StepRegistry steps, String software, Set<String> chosen,
            Consumer<Outcome> whenDone) {
        super("Running " + target.method().method().name() + " version " + target.version().getNumber() + " on "
                + target.project().getCode());
        this.target = target;
        this.steps = steps;
        this.software = software;
        this.chosen = Set.copyOf(chosen);
        this.whenDone = whenDone;
        setUser(true);
    }

    @Override
    protected void canceling() {
        cancel.cancel();
    }

    @Override
    protected IStatus run(IProgressMonitor monitor) {
        SubMonitor progress = SubMonitor.convert(monitor, getName(), 100);
        MeasurementQuantification job;
        MeasurementQuantification.Plan plan;
        try {
            job = new MeasurementQuantification(target.store(), target.actor(), target.project().getId(),
                    target.version(), target.method(), steps, software);
            plan = chosen(job.plan());
            progress.subTask("Checking " + plan.samples().size() + " measurement(s)");
            job.check(plan);
        } catch (ImportException | IllegalArgumentException e) {
            return Status.error(e.getMessage() + "; nothing quantified", e);
        }
        progress.worked(5);
        SubMonitor fits = progress.split(95).setWorkRemaining(Math.max(1, plan.samples().size()));
        int[] reported = {0};
        MeasurementQuantification.Outcome done;
        try {
            done = job.run(plan, (stored, total) -> {
                fits.subTask(stored + " of " + total + " measurement(s) stored");
                fits.worked((int) stored - reported[0]);
                reported[0] = (int) stored;
            }, cancel);
        } catch (ImportException | RuntimeException e) {
            return Status.error(getName() + " failed: " + e.getMessage() + "; the measurements stored before stay",
                    e);
        }
        Outcome outcome = new Outcome(done.stored(), done.skipped(), done.cancelled());
        whenDone.accept(outcome);
        if (outcome.cancelled()) {
            return Status.CANCEL_STATUS;
        }
        return Status.info("Quantified " + outcome.stored() + " measurement(s) of project " + target.project().getCode()
                + " with method '" + target.method().method().name() + "' version " + target.version().getNumber()
                + "; skipped " + outcome.skipped() + " quantified with it before");
    }

    /** The plan cut down to the chosen measurements; skipped are the chosen ones analysed with the version. */
    private MeasurementQuantification.Plan chosen(MeasurementQuantification.Plan all) {
        if (chosen.isEmpty()) {
            return all;
        }
        List<Measurement> samples = all.samples().stream()
                .filter(m -> chosen.contains(m.getId())).toList();
        Set<String> analysed = target.store().analyses().analysed(target.actor(), target.project().getId(),
                target.version().getId());
        int skipped = (int) chosen.stream().filter(analysed::contains).count();
        return new MeasurementQuantification.Plan(samples, skipped, Map.of());
    }
}
