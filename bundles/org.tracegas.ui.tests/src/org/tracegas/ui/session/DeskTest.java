package org.tracegas.ui.session;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.model.MethodVersion;
import org.tracegas.store.Session;
import org.tracegas.ui.jobs.AnalysisRuns;
import org.tracegas.ui.jobs.BatchQuantificationJob;

class DeskTest {

    @TempDir
    Path folder;

    @Test
    void aFinishedRunReachesTheListenersAndMarksTheMethodVersionFrozen() throws Exception {
        try (WorkspaceAccess access = WorkspaceAccess.openH2(folder)) {
            DemoProject.Seeded demo = DemoStaff.seed(access.store());
            Session analyst = access.store().users().logIn(DemoStaff.ANALYST, DemoStaff.PASSWORD.toCharArray());
            Desk desk = Desk.get();
            desk.start(access, analyst, demo);
            MethodVersion version = demo.model().getMethods().get(0).getVersions().get(0);
            assertFalse(version.isFrozen());
            List<List<BatchQuantificationJob.Outcome>> heard = new ArrayList<>();
            java.util.function.Consumer<List<BatchQuantificationJob.Outcome>> listener = heard::add;
            desk.addRunListener(listener);
            BatchQuantificationJob job = AnalysisRuns.job(access, analyst, demo, desk::runFinished);
            job.schedule();
            job.join();
            assertEquals(1, heard.size());
            assertEquals(3, heard.get(0).size());
            assertTrue(version.isFrozen());
            assertTrue(access.store().versions().version(demo.methodVersionId()).frozen(),
                    "the store froze the version the results name");
            desk.removeRunListener(listener);
        }
    }
}
