package org.tracegas.pipeline.shared;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.PreparedStatement;
import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Set;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.stream.IntStream;

import org.h2.jdbcx.JdbcDataSource;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.model.Instrument;
import org.tracegas.model.MeasurementKind;
import org.tracegas.model.Project;
import org.tracegas.model.Provenance;
import org.tracegas.model.Results;
import org.tracegas.model.Role;
import org.tracegas.model.WorkBatch;
import org.tracegas.model.WorkBatches;
import org.tracegas.model.WorkspaceFactory;
import org.tracegas.quantify.CancellationFlag;
import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;
import org.tracegas.store.BatchProgress;
import org.tracegas.store.FailedUnit;
import org.tracegas.store.ProcessedSpectrum;
import org.tracegas.store.SampleEncoding;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;
import org.tracegas.store.Workspaces;

/** Workers sharing a batch in a real H2 workspace: each unit stored once, stops and lost leases honoured. */
class WorkUnitWorkerTest {

    /** SHA-256 of the empty string: FIPS 180-4 test vectors (NIST CAVP, SHA256ShortMsg, Len = 0). */
    private static final String SHA256_OF_EMPTY = "e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855";
    private static final Duration LEASE = Duration.ofMillis(600);
    private static final Duration POLL = Duration.ofMillis(50);

    @TempDir
    Path folder;

    private WorkspaceStore store;
    private Session analyst;
    private Project project;
    private String methodId;
    private String libraryId;
    private String instrumentId;

    @BeforeEach
    void setUp() {
        store = Workspaces.openH2(folder.resolve("db"));
        Session admin = store.users().createFirstAdministrator("admin", "Administrator", "pw-123456".toCharArray());
        store.users().createUser(admin, "ana", "Analyst", Set.of(Role.ANALYST), "pw-234567".toCharArray());
        analyst = store.users().logIn("ana", "pw-234567".toCharArray());
        project = store.projects().createProject(analyst, store.projects().createClient(analyst, "Client").getId(),
                "P-1",
                "Project");
        methodId = store.versions().create(analyst, org.tracegas.model.VersionKind.METHOD, "m", "a=1\n", "t").getId();
        libraryId = store.versions().create(analyst, org.tracegas.model.VersionKind.LIBRARY, "l", "b=1\n", "t").getId();
        // an invented analyzer: HeNe reference laser, 15798 cm-1 (632.99 nm in air; common practice, no source)
        Instrument analyzer = WorkspaceFactory.eINSTANCE.createInstrument();
        analyzer.setName("Stack analyzer");
        analyzer.setSerialNumber("TB-0009");
        analyzer.setLaserWavenumber(15798.0);
        analyzer.setMaxPathDifference(1.0);
        analyzer.setCellPathLength(6.4);
        instrumentId = store.instruments().record(analyst, analyzer).getId();
    }

    @AfterEach
    void tearDown() {
        store.close();
    }

    /**
     * Unit payload "n" becomes two spectra measured at minutes 2n and 2n + 1 by the analyzer, each with one CO
     * result.
     */
    private List<ProcessedSpectrum> block(String payload) {
        int n = Integer.parseInt(payload);
        List<ProcessedSpectrum> block = new ArrayList<>();
        for (int k = 0; k < 2; k++) {
            int minute = 2 * n + k;
            block.add(new ProcessedSpectrum(MeasurementKind.SAMPLE, Instant.EPOCH.plusSeconds(60L * minute), 438.15,
                    1013.0, new Spectrum(SpectralAxis.uniform(AxisUnit.WAVENUMBER, 2000, 1, 4),
                            new double[] {minute, 0, 0, minute}, Ordinate.ABSORBANCE), SampleEncoding.FLOAT32_LE,
                    List.of(Results.of(null, "CO", minute, 0.5, 0.2, "ppm", Set.of(),
                            new Provenance(methodId, libraryId, "0.1.0", SHA256_OF_EMPTY), null)), instrumentId));
        }
        return block;
    }

    private WorkBatch batch(int units) {
        return store.workUnits().createBatch(analyst, project.getId(), WorkBatches.of(null, "test batch"),
                IntStream.range(0, units).mapToObj(Integer::toString).toList());
    }

    private WorkUnitWorker worker(WorkBatch batch, String runner, UnitProcessor processor) {
        return new WorkUnitWorker(store, analyst, batch.getId(), runner, LEASE, POLL, processor);
    }

    @Test
    void threeWorkersShareABatchAndStoreEachUnitOnce() throws Exception {
        WorkBatch batch = batch(9);
        List<Integer> done = Collections.synchronizedList(new ArrayList<>());
        ExecutorService pool = Executors.newFixedThreadPool(3);
        List<Future<WorkerOutcome>> outcomes = new ArrayList<>();
        try {
            for (int r = 0; r < 3; r++) {
                WorkUnitWorker w = worker(batch, "runner-" + r, (payload, cancel) -> block(payload));
                outcomes.add(pool.submit(() -> w.run((unit, spectra, progress) -> done.add(unit.seq()),
                        new CancellationFlag())));
            }
            int completed = 0;
            for (Future<WorkerOutcome> o : outcomes) {
                WorkerOutcome outcome = o.get();
                assertFalse(outcome.cancelled());
                assertEquals(0, outcome.lost());
                completed += outcome.completed();
            }
            assertEquals(9, completed);
        } finally {
            pool.shutdownNow();
        }
        assertEquals(IntStream.range(0, 9).boxed().toList(), done.stream().sorted().toList());
        assertEquals(new BatchProgress(0, 0, 9, 0), store.workUnits().progress(analyst, batch.getId()));
        List<Instant> times = store.projects().measurements(analyst,
                project.getId()).stream().map(m -> m.getTime()).toList();
        assertEquals(IntStream.range(0, 18).mapToObj(m -> Instant.EPOCH.plusSeconds(60L * m)).toList(), times);
        assertTrue(store.projects().measurements(analyst, project.getId()).stream()
                .allMatch(m -> m.getInstrument() != null && m.getInstrument().getId().equals(instrumentId)),
                "each unit's measurements are stored with their instrument");
        assertTrue(store.verifyAuditTrail().intact());
        assertTrue(store.audit().verifyWorkspace(List.of()).intact(), "the links are bound");
    }

    @Test
    void processingLongerThanTheLeaseKeepsTheUnitByRenewal() throws Exception {
        WorkBatch batch = batch(1);
        WorkerOutcome outcome = worker(batch, "runner-a", (payload, cancel) -> {
            Thread.sleep(4 * LEASE.toMillis());
            // a second runner finds nothing claimable meanwhile: the lease was renewed
            assertTrue(store.workUnits().claim(analyst, batch.getId(), "runner-b", LEASE).isEmpty());
            return block(payload);
        }).run(UnitListener.NONE, new CancellationFlag());
        assertEquals(new WorkerOutcome(1, 0, 0, false), outcome);
    }

    @Test
    void stoppedWorkerGivesItsUnitBackUnstored() throws Exception {
        WorkBatch batch = batch(3);
        CancellationFlag stop = new CancellationFlag();
        WorkerOutcome outcome = worker(batch, "runner-a", (payload, cancel) -> {
            if (payload.equals("1")) {
                stop.cancel();
                long end = System.currentTimeMillis() + 5000;
                while (!cancel.isCancelled() && System.currentTimeMillis() < end) {
                    Thread.sleep(10);
                }
                assertTrue(cancel.isCancelled(), "the processor is told to stop");
            }
            return block(payload);
        }).run(UnitListener.NONE, stop);

        assertEquals(new WorkerOutcome(1, 0, 0, true), outcome);
        assertEquals(new BatchProgress(2, 0, 1, 0), store.workUnits().progress(analyst, batch.getId()),
                "unit 1 is open again at once");
        assertEquals(2, store.projects().measurements(analyst, project.getId()).size());
    }

    @Test
    void unitTakenOverByAnotherRunnerIsDroppedNotStored() throws Exception {
        WorkBatch batch = batch(2);
        WorkerOutcome outcome = worker(batch, "runner-a", (payload, cancel) -> {
            if (payload.equals("0")) {
                takeOver(batch.getId(), 0); // as if the lease had expired and runner-b had claimed unit 0
                long end = System.currentTimeMillis() + 5000;
                while (!cancel.isCancelled() && System.currentTimeMillis() < end) {
                    Thread.sleep(10);
                }
                assertTrue(cancel.isCancelled(), "the failed renewal stops the processor");
            }
            return block(payload);
        }).run(UnitListener.NONE, stopWhenOnlyTheTakenUnitIsLeft(batch));

        assertEquals(1, outcome.lost());
        assertEquals(1, outcome.completed());
        assertEquals(List.of(), store.workUnits().measurementsOf(analyst, batch.getId(), 0));
        assertEquals(2, store.workUnits().measurementsOf(analyst, batch.getId(), 1).size());
    }

    @Test
    void unitWhosePayloadAlwaysFailsIsMarkedFailedAndTheOthersAreWorked() throws Exception {
        WorkBatch batch = batch(4);
        List<String> tried = Collections.synchronizedList(new ArrayList<>());
        UnitProcessor processor = (payload, cancel) -> {
            tried.add(payload);
            if (payload.equals("1")) {
                throw new java.io.IOException("file " + payload + " is truncated");
            }
            return block(payload);
        };
        WorkerOutcome first = worker(batch, "runner-a", processor).run(UnitListener.NONE, new CancellationFlag());
        WorkerOutcome second = worker(batch, "runner-b", processor).run(UnitListener.NONE, new CancellationFlag());

        assertEquals(new WorkerOutcome(3, 0, 1, false), first);
        assertEquals(new WorkerOutcome(0, 0, 0, false), second, "the failed unit is not tried again");
        assertEquals(List.of("0", "1", "2", "3"), tried);
        BatchProgress progress = store.workUnits().progress(analyst, batch.getId());
        assertEquals(new BatchProgress(0, 0, 3, 1), progress);
        assertTrue(progress.finished());
        assertFalse(progress.complete());
        assertEquals(List.of(new FailedUnit(1, "1", "file 1 is truncated")),
                store.workUnits().failures(analyst, batch.getId()));
        assertEquals(6, store.projects().measurements(analyst, project.getId()).size());
        assertTrue(store.verifyAuditTrail().intact());
    }

    /** The batch never finishes (unit 0 is held by a runner that does not exist), so the test stops the worker. */
    private CancellationFlag stopWhenOnlyTheTakenUnitIsLeft(WorkBatch batch) {
        CancellationFlag stop = new CancellationFlag();
        Thread watcher = new Thread(() -> {
            long end = System.currentTimeMillis() + 20_000;
            while (System.currentTimeMillis() < end
                    && store.workUnits().progress(analyst, batch.getId()).done() < 1) {
                sleepQuietly();
            }
            stop.cancel();
        });
        watcher.setDaemon(true);
        watcher.start();
        return stop;
    }

    private static void sleepQuietly() {
        try {
            Thread.sleep(20);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }

    /** What a claim by another runner after expiry writes: the next attempt, under its name, for long. */
    private void takeOver(String batchId, int seq) throws Exception {
        JdbcDataSource ds = new JdbcDataSource();
        ds.setURL("jdbc:h2:file:" + folder.resolve("db").toAbsolutePath().resolve("workspace")
                + ";DB_CLOSE_DELAY=-1;LAZY_QUERY_EXECUTION=TRUE;LOCK_TIMEOUT=30000;CACHE_SIZE=16384");
        try (Connection c = ds.getConnection(); PreparedStatement ps = c.prepareStatement("UPDATE work_unit SET"
                + " claimed_by = 'runner-b', attempt = attempt + 1, lease_until = DATEADD(HOUR, 1, CURRENT_TIMESTAMP)"
                + " WHERE batch_id = ? AND seq = ?")) {
            ps.setString(1, batchId);
            ps.setInt(2, seq);
            assertEquals(1, ps.executeUpdate());
        }
    }
}
