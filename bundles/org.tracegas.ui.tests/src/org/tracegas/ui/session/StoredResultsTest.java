package org.tracegas.ui.session;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.BitSet;
import java.util.List;

import org.eclipse.core.runtime.NullProgressMonitor;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.store.AccessDeniedException;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;
import org.tracegas.store.Workspaces;
import org.tracegas.ui.parts.ConcentrationTrace;

class StoredResultsTest {

    @TempDir
    Path folder;

    @Test
    void storedResultsBecomeOneTracePerCompoundInMeasurementTimeOrder() {
        try (WorkspaceStore store = Workspaces.openH2(folder)) {
            ExistingWorkspace ws = new ExistingWorkspace(store);
            Session analyst = store.users().logIn(ExistingWorkspace.ANALYST,
                    ExistingWorkspace.PASSWORD.toCharArray());

            StoredResults.Traces t = StoredResults.traces(store, analyst, ws.project.getId(),
                    new NullProgressMonitor());

            assertEquals(ExistingWorkspace.FIRST_SAMPLE, t.start());
            List<ConcentrationTrace> traces = t.traces();
            assertEquals(List.of("CO", "NO"), traces.stream().map(ConcentrationTrace::compound).toList());
            // samples one minute apart: 0, 1/60 and 2/60 h after the first
            assertArrayEquals(new double[] {0, 1 / 60.0, 2 / 60.0}, traces.get(0).hours(), 1e-12);
            assertArrayEquals(new double[] {41.5, 44.25, 39.75}, traces.get(0).values(), 0.0);
            assertArrayEquals(new double[] {12.0, 12.5, 13.25}, traces.get(1).values(), 0.0);
            assertEquals("ppm", traces.get(1).unit());
            BitSet third = new BitSet();
            third.set(2);
            assertEquals(third, traces.get(1).flagged());
            assertTrue(traces.get(0).flagged().isEmpty());
            assertEquals("Stored results of RIV-2026-05 from 2026-05-04 06:00 UTC",
                    StoredResults.title(ExistingWorkspace.CODE, t));
        }
    }

    @Test
    void aProjectWithoutResultsHasNoTracesAndAUserWithoutGrantIsRefused() {
        try (WorkspaceStore store = Workspaces.openH2(folder)) {
            ExistingWorkspace ws = new ExistingWorkspace(store);
            Session reviewer = store.users().logIn(ExistingWorkspace.REVIEWER,
                    ExistingWorkspace.PASSWORD.toCharArray());
            assertThrows(AccessDeniedException.class,
                    () -> StoredResults.traces(store, reviewer, ws.project.getId(), new NullProgressMonitor()));

            Session analyst = store.users().logIn(ExistingWorkspace.ANALYST,
                    ExistingWorkspace.PASSWORD.toCharArray());
            String client = store.projects().createClient(analyst, "Empty client").getId();
            String empty = store.projects().createProject(analyst, client, "EMPTY-1", "Nothing measured").getId();
            StoredResults.Traces none = StoredResults.traces(store, analyst, empty, new NullProgressMonitor());
            assertTrue(none.traces().isEmpty());
            assertNull(none.start());
        }
    }
}
