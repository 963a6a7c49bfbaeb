package org.tracegas.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Duration;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.stream.IntStream;

import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.tracegas.model.ContentVersion;
import org.tracegas.model.VersionKind;

/** Work units claimed, renewed, released and completed by several runners, on each backend. */
abstract class WorkUnitServiceContract {

    private static final Duration LONG = Duration.ofMinutes(10);
    private static final Duration SHORT = Duration.ofMillis(300);

    private AnalysisFixture f;
    private WorkUnitService units;

    abstract TestBackend newBackend() throws Exception;

    @BeforeEach
    void setUp() throws Exception {
        f = new AnalysisFixture(newBackend());
        units = f.store.workUnits();
    }

    @AfterEach
    void tearDown() throws Exception {
        f.close();
    }

    private WorkBatchInfo batch(int count) {
        return units.createBatch(f.analyst, f.project.getId(), "hour files of 17 March",
                IntStream.range(0, count).mapToObj(i -> "/data/stack/hour-" + i + ".tgc").toList());
    }

    private List<ProcessedSpectrum> blockOf(int unit) {
        return SampleBlocks.block(10 * unit, 3, 2, f.method.getId(), f.library.getId());
    }

    @Test
    void unitsAreClaimedInOrderAndCompletedWithTheirBlock() throws Exception {
        WorkBatchInfo batch = batch(3);
        assertEquals(new BatchProgress(3, 0, 0, 0), units.progress(f.analyst, batch.id()));

        WorkUnitLease a = units.claim(f.analyst, batch.id(), "runner-a", LONG).orElseThrow();
        WorkUnitLease b = units.claim(f.analyst, batch.id(), "runner-b", LONG).orElseThrow();
        WorkUnitLease c = units.claim(f.analyst, batch.id(), "runner-a", LONG).orElseThrow();
        assertEquals(List.of(0, 1, 2), List.of(a.seq(), b.seq(), c.seq()));
        assertEquals("/data/stack/hour-1.tgc", b.payload());
        assertEquals(1, b.attempt());
        assertEquals(Optional.empty(), units.claim(f.analyst, batch.id(), "runner-c", LONG), "all units held");
        assertEquals(new BatchProgress(0, 3, 0, 0), units.progress(f.analyst, batch.id()));

        List<StoredMeasurement> stored = units.complete(f.analyst, b, blockOf(1));

        assertEquals(new BatchProgress(0, 2, 1, 0), units.progress(f.reader, batch.id()));
        assertEquals(stored.stream().map(StoredMeasurement::measurementId).toList(),
                units.measurementsOf(f.analyst, batch.id(), 1));
        assertEquals(6, f.store.results().results(f.analyst, f.project.getId()).size());
        units.complete(f.analyst, a, List.of()); // a unit may produce nothing
        units.complete(f.analyst, c, blockOf(2));
        assertTrue(units.progress(f.analyst, batch.id()).finished());
        assertEquals(Optional.empty(), units.claim(f.analyst, batch.id(), "runner-c", LONG));
        assertEquals(0, f.count("SELECT COUNT(*) FROM work_unit WHERE done_at IS NULL"));
        assertTrue(f.store.verifyAuditTrail().intact());
    }

    @Test
    void expiredLeaseIsClaimedAgainAndTheStaleCompletionIsRefused() throws Exception {
        WorkBatchInfo batch = batch(2);
        WorkUnitLease stale = units.claim(f.analyst, batch.id(), "runner-a", SHORT).orElseThrow();
        Thread.sleep(3 * SHORT.toMillis());

        WorkUnitLease taken = units.claim(f.analyst, batch.id(), "runner-b", LONG).orElseThrow();
        assertEquals(stale.seq(), taken.seq(), "the expired unit comes first again");
        assertEquals(2, taken.attempt());
        long rows = f.count("SELECT COUNT(*) FROM measurement");

        LeaseLostException lost = assertThrows(LeaseLostException.class,
                () -> units.complete(f.analyst, stale, blockOf(0)));
        assertTrue(lost.getMessage().contains("runner-b") && lost.getMessage().contains(stale.unitName()),
                lost.getMessage());
        assertThrows(LeaseLostException.class, () -> units.renew(f.analyst, stale, LONG));
        assertThrows(LeaseLostException.class, () -> units.release(f.analyst, stale));
        assertEquals(rows, f.count("SELECT COUNT(*) FROM measurement"), "the refused completion wrote nothing");

        units.complete(f.analyst, taken, blockOf(0));
        assertEquals(3, units.measurementsOf(f.analyst, batch.id(), taken.seq()).size());
        assertThrows(LeaseLostException.class, () -> units.complete(f.analyst, taken, blockOf(0)),
                "a done unit is not completed twice");
        assertEquals(3, f.count("SELECT COUNT(*) FROM measurement"));
        assertTrue(f.store.verifyAuditTrail().intact());
    }

    @Test
    void expiredLeaseNobodyTookStillCompletes() throws Exception {
        WorkBatchInfo batch = batch(1);
        WorkUnitLease late = units.claim(f.analyst, batch.id(), "runner-a", SHORT).orElseThrow();
        Thread.sleep(3 * SHORT.toMillis());
        units.complete(f.analyst, late, blockOf(0));
        assertEquals(new BatchProgress(0, 0, 1, 0), units.progress(f.analyst, batch.id()));
    }

    @Test
    void renewedLeaseKeepsTheUnitAndReleasedUnitIsClaimableAtOnce() throws Exception {
        WorkBatchInfo batch = batch(2);
        WorkUnitLease a = units.claim(f.analyst, batch.id(), "runner-a", SHORT).orElseThrow();
        WorkUnitLease renewed = units.renew(f.analyst, a, LONG);
        assertTrue(renewed.leaseUntil().isAfter(a.leaseUntil()));
        Thread.sleep(3 * SHORT.toMillis());
        assertEquals(1, units.claim(f.analyst, batch.id(), "runner-b", LONG).orElseThrow().seq(),
                "the renewed unit 0 is not taken");

        units.release(f.analyst, renewed);
        WorkUnitLease again = units.claim(f.analyst, batch.id(), "runner-b", LONG).orElseThrow();
        assertEquals(0, again.seq());
        assertEquals(2, again.attempt());
        assertThrows(LeaseLostException.class, () -> units.complete(f.analyst, renewed, blockOf(0)));
    }

    @Test
    void concurrentRunnersNeverClaimTheSameUnit() throws Exception {
        int count = 60;
        WorkBatchInfo batch = batch(count);
        List<Integer> claimed = Collections.synchronizedList(new ArrayList<>());
        ExecutorService pool = Executors.newFixedThreadPool(6);
        try {
            List<Future<?>> runners = new ArrayList<>();
            for (int r = 0; r < 6; r++) {
                String runner = "runner-" + r;
                runners.add(pool.submit(() -> {
                    Optional<WorkUnitLease> lease;
                    while ((lease = units.claim(f.analyst, batch.id(), runner, LONG)).isPresent()) {
                        claimed.add(lease.get().seq());
                        units.complete(f.analyst, lease.get(), List.of());
                    }
                    return null;
                }));
            }
            for (Future<?> r : runners) {
                r.get();
            }
        } finally {
            pool.shutdownNow();
        }
        assertEquals(IntStream.range(0, count).boxed().toList(), claimed.stream().sorted().toList());
        assertEquals(new BatchProgress(0, 0, count, 0), units.progress(f.analyst, batch.id()));
        assertEquals(count, f.count("SELECT COUNT(*) FROM work_unit WHERE attempt = 1"));
        assertTrue(f.store.verifyAuditTrail().intact());
    }

    @Test
    void batchIsReadBackAsCreated() {
        WorkBatchInfo created = batch(2);
        assertEquals(created, units.batch(f.reader, created.id()), "a reader of the project sees the batch");
        assertEquals("hour files of 17 March", units.batch(f.analyst, created.id()).description());
        assertThrows(NoSuchObjectException.class, () -> units.batch(f.analyst, "no-such-batch"));
    }

    private WorkBatchInfo quantification(ContentVersion method, String... files) {
        return quantification(method.getId(), files);
    }

    private WorkBatchInfo quantification(String methodVersionId, String... files) {
        return units.createBatch(f.analyst, f.project.getId(), methodVersionId, "quantification", List.of(files));
    }

    @Test
    void secondBatchOfAMethodVersionIsRefusedUntilTheFirstIsFinished() throws Exception {
        WorkBatchInfo first = quantification(f.method, "/data/a.tgc", "/data/b.tgc");
        assertEquals(f.method.getId(), first.methodVersionId());
        assertEquals(first, units.batch(f.reader, first.id()));
        assertEquals(Optional.of(first), units.unfinishedBatch(f.reader, f.project.getId(), f.method.getId()));

        // other files are refused too: the project holds one set of results per method version
        UnfinishedBatchException refused = assertThrows(UnfinishedBatchException.class,
                () -> quantification(f.method, "/data/c.tgc"));
        assertEquals(first.id(), refused.batchId());
        assertTrue(refused.getMessage().contains("project WU-1 has the unfinished work batch " + first.id())
                && refused.getMessage().contains("2 of 2 units not done"), refused.getMessage());
        assertEquals(1, f.count("SELECT COUNT(*) FROM work_batch"), "the refused batch wrote nothing");

        // another method version, and work not tied to a method version, go on beside it
        ContentVersion otherMethod = f.store.versions().create(f.analyst, VersionKind.METHOD, "NO in flue gas",
                "analyte=NO\n", "first");
        WorkBatchInfo beside = quantification(otherMethod, "/data/a.tgc");
        batch(1);

        WorkUnitLease a = units.claim(f.analyst, first.id(), "runner-a", LONG).orElseThrow();
        units.complete(f.analyst, a, blockOf(0));
        WorkUnitLease b = units.claim(f.analyst, first.id(), "runner-a", LONG).orElseThrow();
        refused = assertThrows(UnfinishedBatchException.class, () -> quantification(f.method, "/data/a.tgc"),
                "a claimed unit is unfinished");
        assertTrue(refused.getMessage().contains("1 of 2 units not done"), refused.getMessage());
        units.release(f.analyst, b);
        assertThrows(UnfinishedBatchException.class, () -> quantification(f.method, "/data/a.tgc"),
                "a released unit is open again");
        units.complete(f.analyst, units.claim(f.analyst, first.id(), "runner-a", LONG).orElseThrow(), blockOf(1));

        assertEquals(Optional.empty(), units.unfinishedBatch(f.analyst, f.project.getId(), f.method.getId()));
        assertEquals(Optional.of(beside), units.unfinishedBatch(f.analyst, f.project.getId(), otherMethod.getId()));
        WorkBatchInfo next = quantification(f.method, "/data/a.tgc");
        assertEquals(Optional.of(next), units.unfinishedBatch(f.analyst, f.project.getId(), f.method.getId()));
        assertEquals(4, f.count("SELECT COUNT(*) FROM work_batch"));
        assertTrue(f.store.verifyAuditTrail().intact());
    }

    @Test
    void batchOfAnUnknownOrNonMethodVersionIsRefused() throws Exception {
        assertThrows(NoSuchObjectException.class, () -> quantification(f.library, "/data/a.tgc"),
                "a LIBRARY version does not quantify");
        assertThrows(NoSuchObjectException.class, () -> quantification("no-such-version", "/data/a.tgc"));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> units.createBatch(f.analyst, f.project.getId(), " ", "x", List.of("/a")));
        assertTrue(e.getMessage().startsWith("methodVersionId"), e.getMessage());
        assertThrows(AccessDeniedException.class, () -> units.createBatch(f.reader, f.project.getId(), f.method.getId(),
                "x", List.of("/a")));
        assertEquals(0, f.count("SELECT COUNT(*) FROM work_batch"));
    }

    @Test
    void ofRunnersCreatingBatchesOfOneMethodVersionAtOnceExactlyOneSucceeds() throws Exception {
        int runners = 8;
        for (int round = 0; round < 3; round++) {
            ContentVersion method = f.store.versions().create(f.analyst, VersionKind.METHOD, "method " + round,
                    "analyte=CO\n", "first");
            CountDownLatch start = new CountDownLatch(1);
            ExecutorService pool = Executors.newFixedThreadPool(runners);
            List<Future<WorkBatchInfo>> tries = new ArrayList<>();
            try {
                for (int r = 0; r < runners; r++) {
                    String file = "/data/runner-" + r + ".tgc";
                    tries.add(pool.submit(() -> {
                        start.await();
                        return quantification(method, file);
                    }));
                }
                start.countDown();
                List<WorkBatchInfo> created = new ArrayList<>();
                List<String> named = new ArrayList<>();
                for (Future<WorkBatchInfo> t : tries) {
                    try {
                        created.add(t.get());
                    } catch (ExecutionException e) {
                        named.add(((UnfinishedBatchException) e.getCause()).batchId());
                    }
                }
                assertEquals(1, created.size(), "round " + round + ": batches created " + created);
                assertEquals(Collections.nCopies(runners - 1, created.get(0).id()), named);
                assertEquals(Optional.of(created.get(0)),
                        units.unfinishedBatch(f.analyst, f.project.getId(), method.getId()));
            } finally {
                pool.shutdownNow();
            }
        }
        assertEquals(3, f.count("SELECT COUNT(*) FROM work_batch"));
        assertTrue(f.store.verifyAuditTrail().intact());
    }

    @Test
    void wrongArgumentsAndMissingRightsAreRefused() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> units.createBatch(f.analyst, f.project.getId(), "x", List.of("/a", " ", "/c")));
        assertTrue(e.getMessage().startsWith("payloads[1]"), e.getMessage());
        WorkBatchInfo batch = batch(1);
        assertThrows(AccessDeniedException.class, () -> units.claim(f.reader, batch.id(), "runner-r", LONG));
        assertThrows(AccessDeniedException.class,
                () -> units.createBatch(f.reader, f.project.getId(), "x", List.of("/a")));
        e = assertThrows(IllegalArgumentException.class,
                () -> units.claim(f.analyst, batch.id(), "runner-a", Duration.ZERO));
        assertTrue(e.getMessage().startsWith("lease"), e.getMessage());
        assertThrows(NoSuchObjectException.class, () -> units.progress(f.analyst, "no-such-batch"));
        assertFalse(units.progress(f.reader, batch.id()).finished());
    }

    @Test
    void failedUnitIsNeverClaimedAgainAndFinishesItsBatchIncomplete() throws Exception {
        WorkBatchInfo batch = quantification(f.method, "/data/a.tgc", "/data/b.tgc", "/data/c.tgc");
        WorkUnitLease a = units.claim(f.analyst, batch.id(), "runner-a", LONG).orElseThrow();
        WorkUnitLease b = units.claim(f.analyst, batch.id(), "runner-b", LONG).orElseThrow();
        units.fail(f.analyst, a, "/data/a.tgc: record 2 is cut short");
        assertEquals(new BatchProgress(1, 1, 0, 1), units.progress(f.reader, batch.id()));
        assertThrows(LeaseLostException.class, () -> units.complete(f.analyst, a, blockOf(0)),
                "a failed unit takes no results");
        assertThrows(LeaseLostException.class, () -> units.fail(f.analyst, a, "again"));
        assertThrows(IllegalArgumentException.class, () -> units.fail(f.analyst, b, " "));

        units.complete(f.analyst, b, blockOf(1));
        WorkUnitLease c = units.claim(f.analyst, batch.id(), "runner-b", SHORT).orElseThrow();
        assertEquals(2, c.seq(), "the failed unit 0 is skipped");
        units.fail(f.analyst, c, "x".repeat(WorkUnitService.MAX_TEXT_LENGTH + 10));
        Thread.sleep(2 * SHORT.toMillis());
        assertEquals(Optional.empty(), units.claim(f.analyst, batch.id(), "runner-c", LONG),
                "failed units have no lease to expire");

        BatchProgress p = units.progress(f.analyst, batch.id());
        assertEquals(new BatchProgress(0, 0, 1, 2), p);
        assertTrue(p.finished());
        assertFalse(p.complete());
        List<FailedUnit> failed = units.failures(f.reader, batch.id());
        assertEquals(List.of(0, 2), failed.stream().map(FailedUnit::seq).toList());
        assertEquals(new FailedUnit(0, "/data/a.tgc", "/data/a.tgc: record 2 is cut short"), failed.get(0));
        assertEquals(WorkUnitService.MAX_TEXT_LENGTH, failed.get(1).error().length());
        assertEquals(List.of(), units.measurementsOf(f.analyst, batch.id(), 0));
        assertEquals(Optional.empty(), units.unfinishedBatch(f.analyst, f.project.getId(), f.method.getId()),
                "a finished batch with failures no longer blocks a batch of its failed files");
        assertEquals(2, f.count("SELECT COUNT(*) FROM work_unit WHERE state = 'FAILED' AND lease_until IS NULL"
                + " AND done_at IS NOT NULL"));
        assertTrue(f.store.verifyAuditTrail().intact());
    }
}
