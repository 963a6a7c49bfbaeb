package org.tracegas.ui.flows;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.lang.reflect.InvocationTargetException;
import java.lang.reflect.Method;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.concurrent.atomic.AtomicReference;

import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.IStatus;
import org.eclipse.core.runtime.NullProgressMonitor;
import org.eclipse.core.runtime.OperationCanceledException;
import org.eclipse.core.runtime.RegistryFactory;
import org.eclipse.core.runtime.Status;
import org.eclipse.core.runtime.jobs.Job;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.audit.AuditQuery;
import org.tracegas.importer.ReaderRegistry;
import org.tracegas.model.VersionKind;
import org.tracegas.pipeline.FileMeasurements;
import org.tracegas.preprocess.StepRegistry;
import org.tracegas.store.WorkspaceStore;
import org.tracegas.ui.internal.RunMethodHandler;
import org.tracegas.ui.jobs.AnalysisRuns;
import org.tracegas.ui.jobs.FileImportJob;
import org.tracegas.ui.jobs.StoredMethodRunJob;

/**
 * Cancelling the desk's import and method-run jobs on a real H2 workspace: cancelled before they store, they
 * store nothing, neither rows nor audit records. The jobs run in the test's thread with a progress monitor that
 * is cancelled at a chosen step, as the progress view's stop button cancels the monitor of a running job (and,
 * for the run, calls the job's {@code canceling()}, as {@link Job#cancel()} does for a running job).
 */
class DeskCancelTest {

    @TempDir
    Path folder;

    private LabDesk desk;

    @BeforeEach
    void openWorkspace() throws Exception {
        desk = new LabDesk(folder, 640, 480);
    }

    @AfterEach
    void close() {
        desk.close();
    }

    @Test
    void anImportCancelledWhileReadingTheFilesStoresNothing() throws Exception {
        LimeKilnLab lab = desk.lab;
        List<Path> files = lab.morning();
        Counts before = Counts.of(desk);
        List<FileImportJob.Outcome> outcomes = new ArrayList<>();
        FileImportJob job = new FileImportJob(desk.access.store(), lab.analyst, lab.project,
                ReaderRegistry.fromPlatform(), files, new FileMeasurements.Defaults(null,
                        LimeKilnLab.T0.plusSeconds(180), LimeKilnLab.T_CELL, LimeKilnLab.P_CELL), outcomes::add);

        // the stop button pressed while the third file is being read
        IStatus status = run(job, new CancelledAt("Reading s03.jdx"));

        assertEquals(IStatus.CANCEL, status.getSeverity(), status.toString());
        assertEquals(before, Counts.of(desk));
        assertEquals(0, before.measurements(), "nothing imported before either");
        assertTrue(outcomes.isEmpty(), "nothing stored, nothing to report: " + outcomes);

        // the same files imported without cancelling are stored: the counts above could change
        assertEquals(IStatus.INFO, run(job, new NullProgressMonitor()).getSeverity());
        assertEquals(4, Counts.of(desk).measurements());
    }

    @Test
    void aMethodRunCancelledBeforeItsFirstSampleStoresNothing() throws Exception {
        LimeKilnLab lab = desk.lab;
        desk.importedMorning();
        WorkspaceStore store = desk.access.store();
        Counts before = Counts.of(desk);
        StoredMethodRunJob.Target target = RunMethodHandler.target(store, lab.project,
                store.versions().latest(VersionKind.METHOD).get(0));
        AtomicReference<StoredMethodRunJob.Outcome> outcome = new AtomicReference<>();
        StoredMethodRunJob job = new StoredMethodRunJob(target, StepRegistry.fromExtensions(
                RegistryFactory.getRegistry()), AnalysisRuns.software(), Set.of(), outcome::set);

        // cancelled while the chosen samples are checked, before the first is fitted and stored
        CancelledAt monitor = new CancelledAt("Checking ");
        monitor.whenCancelled = () -> canceling(job);
        IStatus status = run(job, monitor);

        assertEquals(IStatus.CANCEL, status.getSeverity(), status.toString());
        assertTrue(outcome.get() == null || outcome.get().stored() == 0, String.valueOf(outcome.get()));
        assertEquals(before, Counts.of(desk));
        assertEquals(0, before.results(), "no results before either");

        StoredMethodRunJob again = new StoredMethodRunJob(target, StepRegistry.fromExtensions(
                RegistryFactory.getRegistry()), AnalysisRuns.software(), Set.of(), outcome::set);
        assertEquals(IStatus.INFO, run(again, new NullProgressMonitor()).getSeverity());
        assertTrue(Counts.of(desk).results() > 0, "a run not cancelled stores results");
    }

    /** What the workspace holds for the lab's project, and the length of the whole audit trail. */
    private record Counts(int measurements, int sourcedMeasurements, int results, int auditRecords) {

        static Counts of(LabDesk desk) {
            WorkspaceStore store = desk.access.store();
            LimeKilnLab lab = desk.lab;
            return new Counts(store.projects().measurements(lab.analyst, lab.project.getId()).size(),
                    store.imports().measurements(lab.analyst, lab.project.getId()).size(),
                    store.results().results(lab.analyst, lab.project.getId()).size(),
                    store.audit().review(lab.reviewer, AuditQuery.all().build()).records().size());
        }
    }

    /**
     * Runs a job's {@code run} in this thread with the monitor given; a job that stops by throwing
     * {@link OperationCanceledException} ends cancelled, as the job manager ends it.
     */
    private static IStatus run(Job job, IProgressMonitor monitor) throws Exception {
        Method run = Job.class.getDeclaredMethod("run", IProgressMonitor.class);
        run.setAccessible(true);
        try {
            return (IStatus) run.invoke(job, monitor);
        } catch (InvocationTargetException e) {
            if (e.getCause() instanceof OperationCanceledException) {
                return Status.CANCEL_STATUS;
            }
            throw e;
        }
    }

    /** What the job manager calls on a running job that is cancelled. */
    private static void canceling(Job job) {
        try {
            Method m = Job.class.getDeclaredMethod("canceling");
            m.setAccessible(true);
            m.invoke(job);
        } catch (ReflectiveOperationException e) {
            throw new IllegalStateException(e);
        }
    }

    /** A progress monitor cancelled when a sub-task starting with the given words begins. */
    private static final class CancelledAt extends NullProgressMonitor {

        private final String step;
        private Runnable whenCancelled = () -> { };

        CancelledAt(String step) {
            this.step = step;
        }

        @Override
        public void subTask(String name) {
            if (name.startsWith(step) && !isCanceled()) {
                setCanceled(true);
                whenCancelled.run();
            }
        }
    }
}
