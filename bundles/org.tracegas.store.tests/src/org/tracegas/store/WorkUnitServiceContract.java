package org.tracegas.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.time.Duration;
import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.stream.IntStream;

import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.tracegas.model.ContentVersion;
import org.tracegas.model.VersionKind;
import org.tracegas.model.WorkBatch;
import org.tracegas.model.WorkBatches;

/** Work units claimed, renewed, released and completed by several runners, on each backend. */
abstract class WorkUnitServiceContract extends AnalysisFixtureContract {

    private static final Duration LONG = Duration.ofMinutes(10);
    private static final Duration SHORT = Duration.ofMillis(300);

    private WorkUnitService units;

    @BeforeEach
    void setUp() {
        units = f.store.workUnits();
    }

    private WorkBatch batch(int count) {
        return units.createBatch(f.analyst, f.project.getId(), WorkBatches.of(null, "hour files of 17 March"),
                IntStream.range(0, count).mapToObj(i -> "/data/stack/hour-" + i + ".tgc").toList());
    }

    /** What a batch says, its project included: model objects are equal only to themselves. */
    private static List<Object> fields(WorkBatch b) {
        return Arrays.asList(b.getId(), b.getProject().getId(), b.getProject().getCode(), b.getMethodVersionId(),
                b.getDescription(), b.getUnitCount(), b.getCreatedBy(), b.getCreatedAt());
    }

    private static Optional<List<Object>> fields(Optional<WorkBatch> b) {
        return b.map(WorkUnitServiceContract::fields);
    }

    private List<ProcessedSpectrum> blockOf(int unit) {
        return SampleBlocks.block(10 * unit, 3, 2, f.method.getId(), f.library.getId());
    }

    @Test
    void unitsAreClaimedInOrderAndCompletedWithTheirBlock() throws Exception {
        WorkBatch batch = batch(3);
        assertEquals(new BatchProgress(3, 0, 0, 0), units.progress(f.analyst, batch.getId()));

        WorkUnitLease a = units.claim(f.analyst, batch.getId(), "runner-a", LONG).orElseThrow();
        WorkUnitLease b = units.claim(f.analyst, batch.getId(), "runner-b", LONG).orElseThrow();
        WorkUnitLease c = units.claim(f.analyst, batch.getId(), "runner-a", LONG).orElseThrow();
        assertEquals(List.of(0, 1, 2), List.of(a.seq(), b.seq(), c.seq()));
        assertEquals("/data/stack/hour-1.tgc", b.payload());
        assertEquals(1, b.attempt());
        assertEquals(Optional.empty(), units.claim(f.analyst, batch.getId(), "runner-c", LONG), "all units held");
        assertEquals(new BatchProgress(0, 3, 0, 0), units.progress(f.analyst, batch.getId()));

        List<StoredMeasurement> stored = units.complete(f.analyst, b, blockOf(1));

        assertEquals(new BatchProgress(0, 2, 1, 0), units.progress(f.reader, batch.getId()));
        assertEquals(stored.stream().map(StoredMeasurement::measurementId).toList(),
                units.measurementsOf(f.analyst, batch.getId(), 1));
        assertEquals(6, f.store.results().results(f.analyst, f.project.getId()).size());
        units.complete(f.analyst, a, List.of()); // a unit may produce nothing
        units.complete(f.analyst, c, blockOf(2));
        assertTrue(units.progress(f.analyst, batch.getId()).finished());
        assertEquals(Optional.empty(), units.claim(f.analyst, batch.getId(), "runner-c", LONG));
        assertEquals(0, f.count("SELECT COUNT(*) FROM work_unit WHERE done_at IS NULL"));
        assertTrue(f.store.verifyAuditTrail().intact());
    }

    @Test
    void expiredLeaseIsClaimedAgainAndTheStaleCompletionIsRefused() throws Exception {
        WorkBatch batch = batch(2);
        WorkUnitLease stale = units.claim(f.analyst, batch.getId(), "runner-a", SHORT).orElseThrow();
        Thread.sleep(3 * SHORT.toMillis());

        WorkUnitLease taken = units.claim(f.analyst, batch.getId(), "runner-b", LONG).orElseThrow();
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
        assertEquals(3, units.measurementsOf(f.analyst, batch.getId(), taken.seq()).size());
        assertThrows(LeaseLostException.class, () -> units.complete(f.analyst, taken, blockOf(0)),
                "a done unit is not completed twice");
        assertEquals(3, f.count("SELECT COUNT(*) FROM measurement"));
        assertTrue(f.store.verifyAuditTrail().intact());
    }

    @Test
    void expiredLeaseNobodyTookStillCompletes() throws Exception {
        WorkBatch batch = batch(1);
        WorkUnitLease late = units.claim(f.analyst, batch.getId(), "runner-a", SHORT).orElseThrow();
        Thread.sleep(3 * SHORT.toMillis());
        units.complete(f.analyst, late, blockOf(0));
        assertEquals(new BatchProgress(0, 0, 1, 0), units.progress(f.analyst, batch.getId()));
    }

    @Test
    void renewedLeaseKeepsTheUnitAndReleasedUnitIsClaimableAtOnce() throws Exception {
        WorkBatch batch = batch(2);
        WorkUnitLease a = units.claim(f.analyst, batch.getId(), "runner-a", SHORT).orElseThrow();
        WorkUnitLease renewed = units.renew(f.analyst, a, LONG);
        assertTrue(renewed.leaseUntil().isAfter(a.leaseUntil()));
        Thread.sleep(3 * SHORT.toMillis());
        assertEquals(1, units.claim(f.analyst, batch.getId(), "runner-b", LONG).orElseThrow().seq(),
                "the renewed unit 0 is not taken");

        units.release(f.analyst, renewed);
        WorkUnitLease again = units.claim(f.analyst, batch.getId(), "runner-b", LONG).orElseThrow();
        assertEquals(0, again.seq());
        assertEquals(2, again.attempt());
        assertThrows(LeaseLostException.class, () -> units.complete(f.analyst, renewed, blockOf(0)));
    }

    @Test
    void concurrentRunnersNeverClaimTheSameUnit() throws Exception {
        int count = 60;
        WorkBatch batch = batch(count);
        List<Integer> claimed = Collections.synchronizedList(new ArrayList<>());
        ExecutorService pool = Executors.newFixedThreadPool(6);
        try {
            List<Future<?>> runners = new ArrayList<>();
            for (int r = 0; r < 6; r++) {
                String runner = "runner-" + r;
                runners.add(pool.submit(() -> {
                    Optional<WorkUnitLease> lease;
                    while ((lease = units.claim(f.analyst, batch.getId(), runner, LONG)).isPresent()) {
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
        assertEquals(new BatchProgress(0, 0, count, 0), units.progress(f.analyst, batch.getId()));
        assertEquals(count, f.count("SELECT COUNT(*) FROM work_unit WHERE attempt = 1"));
        assertTrue(f.store.verifyAuditTrail().intact());
    }

    @Test
    void batchIsReadBackAsCreated() throws Exception {
        Instant before = Instant.now().truncatedTo(ChronoUnit.MICROS);
        WorkBatch asked = WorkBatches.of(f.method.getId(), "hour files of 17 March");
        WorkBatch created = units.createBatch(f.analyst, f.project.getId(), asked,
                List.of("/data/a.tgc", "/data/b.tgc"));
        Instant after = Instant.now();
        assertNull(asked.getId(), "the given batch stays as it was");
        assertEquals(0, asked.getUnitCount());
        assertEquals("WU-1", created.getProject().getCode());
        assertEquals(List.of(created), created.getProject().getBatches());
        assertEquals(f.method.getId(), created.getMethodVersionId());
        assertEquals(2, created.getUnitCount(), "one unit per payload");
        assertEquals(f.analyst.userId(), created.getCreatedBy());
        assertFalse(created.getCreatedAt().isBefore(before) || created.getCreatedAt().isAfter(after),
                created.getCreatedAt() + " within " + before + " and " + after);
        assertEquals(fields(created), fields(units.batch(f.reader, created.getId())),
                "a reader of the project sees the batch");

        // the row and the audit record as they were written before batches were model objects
        try (Connection c = f.backend.raw(); PreparedStatement ps = c.prepareStatement("SELECT project_id,"
                + " method_version_id, description, unit_count, created_by FROM work_batch WHERE id = ?")) {
            ps.setString(1, created.getId());
            try (ResultSet rs = ps.executeQuery()) {
                assertTrue(rs.next());
                assertEquals(List.of(f.project.getId(), f.method.getId(), "hour files of 17 March", 2,
                        f.analyst.userId()), List.of(rs.getString(1), rs.getString(2), rs.getString(3), rs.getInt(4),
                                rs.getString(5)));
            }
        }
        try (Connection c = f.backend.raw(); PreparedStatement ps = c.prepareStatement("SELECT new_value FROM"
                + " audit_record WHERE object_type = 'work-batch' AND object_id = ?")) {
            ps.setString(1, created.getId());
            try (ResultSet rs = ps.executeQuery()) {
                assertTrue(rs.next());
                // SHA-256 of "/data/a.tgc\n/data/b.tgc\n" as coreutils sha256sum prints it
                assertEquals("description=hour files of 17 March\nmethodVersion=" + f.method.getId()
                        + "\npayloadsSha256=6690d3dfe1434435e16d8bd8d192125dc6123756809720732ca6c03c79079229\nproject="
                        + f.project.getId() + "\nunits=2\n", rs.getString(1));
            }
        }
        assertThrows(NoSuchObjectException.class, () -> units.batch(f.analyst, "no-such-batch"));
    }

    @Test
    void aProjectsBatchesAreListedOldestFirstInTheProject() {
        assertEquals(List.of(), units.batches(f.reader, f.project.getId()));
        WorkBatch other = batch(1);
        WorkBatch quantifying = quantification(f.method, "/data/a.tgc", "/data/b.tgc");
        List<WorkBatch> listed = units.batches(f.reader, f.project.getId());
        assertEquals(List.of(fields(other), fields(quantifying)), listed.stream().map(WorkUnitServiceContract::fields)
                .toList());
        assertEquals(listed, listed.get(0).getProject().getBatches(), "both in one project object");
    }

    @Test
    void anIncompleteBatchIsRefusedNamingTheFieldAndNothingIsWritten() throws Exception {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> units.createBatch(f.analyst, f.project.getId(), null, List.of("/a")));
        assertEquals("batch must not be null", e.getMessage());
        e = assertThrows(IllegalArgumentException.class,
                () -> units.createBatch(f.analyst, f.project.getId(), WorkBatches.of(null, null), List.of("/a")));
        assertTrue(e.getMessage().startsWith("description must be given"), e.getMessage());
        String tooLong = "x".repeat(WorkUnitService.MAX_TEXT_LENGTH + 1);
        e = assertThrows(IllegalArgumentException.class, () -> units.createBatch(f.analyst, f.project.getId(),
                WorkBatches.of(null, tooLong), List.of("/a")));
        assertTrue(e.getMessage().startsWith("description must be given and at most 4000 characters long, was 4001"),
                e.getMessage());
        assertEquals(0, f.count("SELECT COUNT(*) FROM work_batch"));
        assertEquals(0, f.count("SELECT COUNT(*) FROM audit_record WHERE object_type = 'work-batch'"));
    }

    private WorkBatch quantification(ContentVersion method, String... files) {
        return quantification(method.getId(), files);
    }

    private WorkBatch quantification(String methodVersionId, String... files) {
        return units.createBatch(f.analyst, f.project.getId(), WorkBatches.of(methodVersionId, "quantification"),
                List.of(files));
    }

    @Test
    void secondBatchOfAMethodVersionIsRefusedUntilTheFirstIsFinished() throws Exception {
        WorkBatch first = quantification(f.method, "/data/a.tgc", "/data/b.tgc");
        assertEquals(f.method.getId(), first.getMethodVersionId());
        assertEquals(fields(first), fields(units.batch(f.reader, first.getId())));
        assertEquals(Optional.of(fields(first)),
                fields(units.unfinishedBatch(f.reader, f.project.getId(), f.method.getId())));

        // other files are refused too: the project holds one set of results per method version
        UnfinishedBatchException refused = assertThrows(UnfinishedBatchException.class,
                () -> quantification(f.method, "/data/c.tgc"));
        assertEquals(first.getId(), refused.batchId());
        assertTrue(refused.getMessage().contains("project WU-1 has the unfinished work batch " + first.getId())
                && refused.getMessage().contains("2 of 2 units not done"), refused.getMessage());
        assertEquals(1, f.count("SELECT COUNT(*) FROM work_batch"), "the refused batch wrote nothing");

        // another method version, and work not tied to a method version, go on beside it
        ContentVersion otherMethod = f.store.versions().create(f.analyst, VersionKind.METHOD, "NO in flue gas",
                "analyte=NO\n", "first");
        WorkBatch beside = quantification(otherMethod, "/data/a.tgc");
        batch(1);

        WorkUnitLease a = units.claim(f.analyst, first.getId(), "runner-a", LONG).orElseThrow();
        units.complete(f.analyst, a, blockOf(0));
        WorkUnitLease b = units.claim(f.analyst, first.getId(), "runner-a", LONG).orElseThrow();
        refused = assertThrows(UnfinishedBatchException.class, () -> quantification(f.method, "/data/a.tgc"),
                "a claimed unit is unfinished");
        assertTrue(refused.getMessage().contains("1 of 2 units not done"), refused.getMessage());
        units.release(f.analyst, b);
        assertThrows(UnfinishedBatchException.class, () -> quantification(f.method, "/data/a.tgc"),
                "a released unit is open again");
        units.complete(f.analyst, units.claim(f.analyst, first.getId(), "runner-a", LONG).orElseThrow(), blockOf(1));

        assertEquals(Optional.empty(), units.unfinishedBatch(f.analyst, f.project.getId(), f.method.getId()));
        assertEquals(Optional.of(fields(beside)),
                fields(units.unfinishedBatch(f.analyst, f.project.getId(), otherMethod.getId())));
        WorkBatch next = quantification(f.method, "/data/a.tgc");
        assertEquals(Optional.of(fields(next)),
                fields(units.unfinishedBatch(f.analyst, f.project.getId(), f.method.getId())));
        assertEquals(4, f.count("SELECT COUNT(*) FROM work_batch"));
        assertTrue(f.store.verifyAuditTrail().intact());
    }

    @Test
    void batchOfAnUnknownOrNonMethodVersionIsRefused() throws Exception {
        assertThrows(NoSuchObjectException.class, () -> quantification(f.library, "/data/a.tgc"),
                "a LIBRARY version does not quantify");
        assertThrows(NoSuchObjectException.class, () -> quantification("no-such-version", "/data/a.tgc"));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> units.createBatch(f.analyst, f.project.getId(), WorkBatches.of(" ", "x"), List.of("/a")));
        assertTrue(e.getMessage().startsWith("methodVersionId"), e.getMessage());
        assertThrows(AccessDeniedException.class, () -> units.createBatch(f.reader, f.project.getId(),
                WorkBatches.of(f.method.getId(), "x"), List.of("/a")));
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
            List<Future<WorkBatch>> tries = new ArrayList<>();
            try {
                for (int r = 0; r < runners; r++) {
                    String file = "/data/runner-" + r + ".tgc";
                    tries.add(pool.submit(() -> {
                        start.await();
                        return quantification(method, file);
                    }));
                }
                start.countDown();
                List<WorkBatch> created = new ArrayList<>();
                List<String> named = new ArrayList<>();
                for (Future<WorkBatch> t : tries) {
                    try {
                        created.add(t.get());
                    } catch (ExecutionException e) {
                        named.add(((UnfinishedBatchException) e.getCause()).batchId());
                    }
                }
                assertEquals(1, created.size(), "round " + round + ": batches created " + created);
                assertEquals(Collections.nCopies(runners - 1, created.get(0).getId()), named);
                assertEquals(Optional.of(fields(created.get(0))),
                        fields(units.unfinishedBatch(f.analyst, f.project.getId(), method.getId())));
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
                () -> units.createBatch(f.analyst, f.project.getId(), WorkBatches.of(null, "x"),
                        List.of("/a", " ", "/c")));
        assertTrue(e.getMessage().startsWith("payloads[1]"), e.getMessage());
        WorkBatch batch = batch(1);
        assertThrows(AccessDeniedException.class, () -> units.claim(f.reader, batch.getId(), "runner-r", LONG));
        assertThrows(AccessDeniedException.class,
                () -> units.createBatch(f.reader, f.project.getId(), WorkBatches.of(null, "x"), List.of("/a")));
        e = assertThrows(IllegalArgumentException.class,
                () -> units.claim(f.analyst, batch.getId(), "runner-a", Duration.ZERO));
        assertTrue(e.getMessage().startsWith("lease"), e.getMessage());
        assertThrows(NoSuchObjectException.class, () -> units.progress(f.analyst, "no-such-batch"));
        assertFalse(units.progress(f.reader, batch.getId()).finished());
    }

    @Test
    void failedUnitIsNeverClaimedAgainAndFinishesItsBatchIncomplete() throws Exception {
        WorkBatch batch = quantification(f.method, "/data/a.tgc", "/data/b.tgc", "/data/c.tgc");
        WorkUnitLease a = units.claim(f.analyst, batch.getId(), "runner-a", LONG).orElseThrow();
        WorkUnitLease b = units.claim(f.analyst, batch.getId(), "runner-b", LONG).orElseThrow();
        units.fail(f.analyst, a, "/data/a.tgc: record 2 is cut short");
        assertEquals(new BatchProgress(1, 1, 0, 1), units.progress(f.reader, batch.getId()));
        assertThrows(LeaseLostException.class, () -> units.complete(f.analyst, a, blockOf(0)),
                "a failed unit takes no results");
        assertThrows(LeaseLostException.class, () -> units.fail(f.analyst, a, "again"));
        assertThrows(IllegalArgumentException.class, () -> units.fail(f.analyst, b, " "));

        units.complete(f.analyst, b, blockOf(1));
        WorkUnitLease c = units.claim(f.analyst, batch.getId(), "runner-b", SHORT).orElseThrow();
        assertEquals(2, c.seq(), "the failed unit 0 is skipped");
        units.fail(f.analyst, c, "x".repeat(WorkUnitService.MAX_TEXT_LENGTH + 10));
        Thread.sleep(2 * SHORT.toMillis());
        assertEquals(Optional.empty(), units.claim(f.analyst, batch.getId(), "runner-c", LONG),
                "failed units have no lease to expire");

        BatchProgress p = units.progress(f.analyst, batch.getId());
        assertEquals(new BatchProgress(0, 0, 1, 2), p);
        assertTrue(p.finished());
        assertFalse(p.complete());
        List<FailedUnit> failed = units.failures(f.reader, batch.getId());
        assertEquals(List.of(0, 2), failed.stream().map(FailedUnit::seq).toList());
        assertEquals(new FailedUnit(0, "/data/a.tgc", "/data/a.tgc: record 2 is cut short"), failed.get(0));
        assertEquals(WorkUnitService.MAX_TEXT_LENGTH, failed.get(1).error().length());
        assertEquals(List.of(), units.measurementsOf(f.analyst, batch.getId(), 0));
        assertEquals(Optional.empty(), units.unfinishedBatch(f.analyst, f.project.getId(), f.method.getId()),
                "a finished batch with failures no longer blocks a batch of its failed files");
        assertEquals(2, f.count("SELECT COUNT(*) FROM work_unit WHERE state = 'FAILED' AND lease_until IS NULL"
                + " AND done_at IS NOT NULL"));
        assertTrue(f.store.verifyAuditTrail().intact());
    }
}
