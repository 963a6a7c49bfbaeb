package org.tracegas.ui.jobs;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.atomic.AtomicReference;

import org.eclipse.core.runtime.IStatus;
import org.eclipse.core.runtime.NullProgressMonitor;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.store.Session;
import org.tracegas.ui.session.DemoProject;
import org.tracegas.ui.session.DemoStaff;
import org.tracegas.ui.session.WorkspaceAccess;

class BatchQuantificationJobTest {

    @TempDir
    Path folder;

    @Test
    void cancellingStopsAfterTheMeasurementInHandAndReportsWhatWasDone() {
        try (WorkspaceAccess access = WorkspaceAccess.openH2(folder)) {
            DemoProject.Seeded demo = DemoStaff.seed(access.store());
            Session analyst = access.store().users().logIn(DemoStaff.ANALYST, DemoStaff.PASSWORD.toCharArray());
            AtomicReference<List<BatchQuantificationJob.Outcome>> delivered = new AtomicReference<>();
            BatchQuantificationJob job = AnalysisRuns.job(access, analyst, demo, delivered::set);
            NullProgressMonitor monitor = new NullProgressMonitor() {
                private int worked;

                @Override
                public void worked(int work) {
                    worked += work;
                }

                @Override
                public boolean isCanceled() {
                    return worked >= 1;
                }
            };
            IStatus status = job.run(monitor);
            assertEquals(IStatus.CANCEL, status.getSeverity());
            assertEquals(1, delivered.get().size());
            assertEquals(2, access.store().results().results(analyst, demo.projectId()).size(),
                    "the first measurement's two results stay recorded");
            assertTrue(job.outcomes().get(0).result().compound("CO").isPresent());
        }
    }
}
