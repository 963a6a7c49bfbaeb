package org.tracegas.store.internal;

import java.nio.charset.StandardCharsets;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.time.Duration;
import java.time.Instant;
import java.time.OffsetDateTime;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.UUID;

import org.tracegas.audit.AuditAction;
import org.tracegas.audit.AuditEntry;
import org.tracegas.audit.AuditValues;
import org.tracegas.model.AccessLevel;
import org.tracegas.model.WorkBatch;
import org.tracegas.model.WorkspaceFactory;
import org.tracegas.store.BatchProgress;
import org.tracegas.store.FailedUnit;
import org.tracegas.store.LeaseLostException;
import org.tracegas.store.NoSuchObjectException;
import org.tracegas.store.ProcessedSpectrum;
import org.tracegas.store.Session;
import org.tracegas.store.StoredMeasurement;
import org.tracegas.store.UnfinishedBatchException;
import org.tracegas.store.WorkBatchChecks;
import org.tracegas.store.WorkUnitLease;
import org.tracegas.store.WorkUnitService;

final class JdbcWorkUnitService implements WorkUnitService {

    private static final WorkspaceFactory FACTORY = WorkspaceFactory.eINSTANCE;
    private static final String BATCH_COLUMNS = "b.id, b.method_version_id, b.description,"
            + " b.unit_count, b.created_by, b.created_at";
    private static final String UNIT_COLUMNS = "seq, payload, state, claimed_by, lease_until, attempt";
    private static final String CLAIMABLE = "batch_id = ? AND (state = 'OPEN' OR (state = 'CLAIMED' AND lease_until < ?))";

    /** A unit row as read under its lock. */
    private record Unit(int seq, String payload, String state, String claimedBy, Instant leaseUntil, int attempt) {

        static Unit read(ResultSet rs) throws SQLException {
            return new Unit(rs.getInt("seq"), rs.getString("payload"), rs.getString("state"),
                    rs.getString("claimed_by"), Tx.instant(rs, "lease_until"), rs.getInt("attempt"));
        }

        Map<String, Object> fields() {
            Map<String, Object> fields = new LinkedHashMap<>();
            fields.put("state", state);
            fields.put("claimedBy", claimedBy);
            fields.put("leaseUntil", leaseUntil);
            fields.put("attempt", attempt);
            return fields;
        }
    }

    private final Transactions transactions;
    private final Backend backend;
    private final JdbcVersionService versions;

    JdbcWorkUnitService(Transactions transactions, Backend backend, JdbcVersionService versions) {
        this.transactions = transactions;
        this.backend = backend;
        this.versions = versions;
    }

    @Override
    public WorkBatch createBatch(Session actor, String projectId, WorkBatch batch, List<String> payloads) {
        WorkBatchChecks.requireNew(batch);
        if (payloads == null || payloads.isEmpty()) {
            throw new IllegalArgumentException("payloads must hold at least one unit's payload");
        }
        for (int i = 0; i < payloads.size(); i++) {
            String p = payloads.get(i);
            if (p == null || p.isBlank() || p.length() > MAX_TEXT_LENGTH) {
                throw new IllegalArgumentException("payloads[" + i + "] must be non-blank text of at most "
                        + MAX_TEXT_LENGTH + " characters");
            }
        }
        String methodVersionId = batch.getMethodVersionId();
        String description = batch.getDescription();
        return transactions.run("creating a batch of " + payloads.size() + " work units in project " + projectId,
                tx -> {
                    Guard.requireProject(tx, actor, projectId, AccessLevel.WRITE);
                    if (methodVersionId != null) {
                        // held until commit: a second runner's check waits and then sees this batch
                        tx.queryOne(backend.lockProject(), rs -> rs.getString(1), projectId);
                        requireMethodVersion(tx, methodVersionId);
                        Optional<WorkBatch> other = findUnfinished(tx, projectId, methodVersionId);
                        if (other.isPresent()) {
                            throw refusal(tx, other.get());
                        }
                    }
                    WorkBatch created = FACTORY.createWorkBatch();
                    created.setId(UUID.randomUUID().toString());
                    created.setMethodVersionId(methodVersionId);
                    created.setDescription(description);
                    created.setUnitCount(payloads.size());
                    created.setCreatedBy(actor.userId());
                    created.setCreatedAt(Instant.now().truncatedTo(ChronoUnit.MICROS));
                    tx.update("INSERT INTO work_batch (id, project_id, method_version_id, description, unit_count,"
                            + " created_by, created_at) VALUES (?, ?, ?, ?, ?, ?, ?)", created.getId(), projectId,
                            methodVersionId, description, created.getUnitCount(), actor.userId(),
                            created.getCreatedAt());
                    try (PreparedStatement ps = tx.connection().prepareStatement("INSERT INTO work_unit (batch_id,"
                            + " seq, payload, state, attempt) VALUES (?, ?, ?, 'OPEN', 0)")) {
                        for (int i = 0; i < payloads.size(); i++) {
                            Tx.bind(ps, created.getId(), i, payloads.get(i));
                            ps.addBatch();
                        }
                        ps.executeBatch();
                    }
                    Map<String, Object> fields = new LinkedHashMap<>();
                    fields.put("project", projectId);
                    fields.put("methodVersion", methodVersionId);
                    fields.put("description", description);
                    fields.put("units", payloads.size());
                    // SHA-256 of the payloads in unit order, each followed by a line feed
                    fields.put("payloadsSha256", SpectrumCodec.sha256Hex((String.join("\n", payloads) + "\n")
                            .getBytes(StandardCharsets.UTF_8)));
                    tx.audit(AuditEntry.builder(actor.userId(), AuditAction.CREATE, "work-batch", created.getId())
                            .newValue(AuditValues.canonical(fields)).build());
                    return inProject(tx, projectId, created);
                });
    }

    @Override
    public Optional<WorkUnitLease> claim(Session actor, String batchId, String runnerId, Duration lease) {
        requireRunner(runnerId);
        requireLease("lease", lease);
        return transactions.run("claiming a unit of work batch " + batchId, tx -> {
            requireBatchAccess(tx, actor, batchId, AccessLevel.WRITE);
            Instant now = databaseTime(tx);
            Optional<Unit> found = lockClaimable(tx, batchId, now);
            if (found.isEmpty()) {
                return Optional.<WorkUnitLease>empty();
            }
            Unit before = found.get();
            WorkUnitLease claimed = new WorkUnitLease(batchId, before.seq(), before.payload(), runnerId,
                    before.attempt() + 1, now.plus(lease));
            tx.update("UPDATE work_unit SET state = 'CLAIMED', claimed_by = ?, lease_until = ?, attempt = ?"
                    + " WHERE batch_id = ? AND seq = ?", runnerId, claimed.leaseUntil(), claimed.attempt(),
                    batchId, before.seq());
            Map<String, Object> after = new LinkedHashMap<>();
            after.put("state", "CLAIMED");
            after.put("claimedBy", runnerId);
            after.put("leaseUntil", claimed.leaseUntil());
            after.put("attempt", claimed.attempt());
            tx.audit(AuditEntry.builder(actor.userId(), AuditAction.CHANGE, "work-unit", claimed.unitName())
                    .version(claimed.attempt()).oldValue(AuditValues.canonical(before.fields()))
                    .newValue(AuditValues.canonical(after)).build());
            return Optional.of(claimed);
        });
    }

    /** The first claimable unit in unit order that no other transaction holds, locked until commit. */
    private Optional<Unit> lockClaimable(Tx tx, String batchId, Instant now) throws SQLException {
        if (backend.skipLockedWithLimit()) {
            return tx.queryOne("SELECT " + UNIT_COLUMNS + " FROM work_unit WHERE " + CLAIMABLE
                    + " ORDER BY seq LIMIT 1 FOR UPDATE SKIP LOCKED", Unit::read, batchId, now);
        }
        List<Integer> candidates = tx.queryList("SELECT seq FROM work_unit WHERE " + CLAIMABLE + " ORDER BY seq",
                rs -> rs.getInt(1), batchId, now);
        for (int seq : candidates) {
            // the condition is evaluated again on the locked row: another claim may have committed meanwhile
            Optional<Unit> locked = tx.queryOne("SELECT " + UNIT_COLUMNS + " FROM work_unit WHERE " + CLAIMABLE
                    + " AND seq = ? FOR UPDATE SKIP LOCKED", Unit::read, batchId, now, seq);
            if (locked.isPresent()) {
                return locked;
            }
        }
        return Optional.empty();
    }

    @Override
    public WorkUnitLease renew(Session actor, WorkUnitLease lease, Duration extension) {
        requireLease("extension", extension);
        return transactions.run("renewing the lease of work unit " + name(lease), tx -> {
            requireBatchAccess(tx, actor, lease.batchId(), AccessLevel.WRITE);
            Unit before = lockOwn(tx, lease, "renew");
            WorkUnitLease renewed = new WorkUnitLease(lease.batchId(), lease.seq(), lease.payload(),
                    lease.runnerId(), lease.attempt(), databaseTime(tx).plus(extension));
            tx.update("UPDATE work_unit SET lease_until = ? WHERE batch_id = ? AND seq = ?", renewed.leaseUntil(),
                    lease.batchId(), lease.seq());
            tx.audit(AuditEntry.builder(actor.userId(), AuditAction.CHANGE, "work-unit", lease.unitName())
                    .version(lease.attempt())
                    .oldValue(AuditValues.canonical(Map.of("leaseUntil", before.leaseUntil())))
                    .newValue(AuditValues.canonical(Map.of("leaseUntil", renewed.leaseUntil()))).build());
            return renewed;
        });
    }

    @Override
    public void release(Session actor, WorkUnitLease lease) {
        transactions.run("releasing work unit " + name(lease), tx -> {
            requireBatchAccess(tx, actor, lease.batchId(), AccessLevel.WRITE);
            Unit before = lockOwn(tx, lease, "release");
            tx.update("UPDATE work_unit SET state = 'OPEN', claimed_by = NULL, lease_until = NULL"
                    + " WHERE batch_id = ? AND seq = ?", lease.batchId(), lease.seq());
            Map<String, Object> after = new LinkedHashMap<>();
            after.put("state", "OPEN");
            after.put("claimedBy", null);
            after.put("leaseUntil", null);
            after.put("attempt", before.attempt());
            tx.audit(AuditEntry.builder(actor.userId(), AuditAction.CHANGE, "work-unit", lease.unitName())
                    .version(lease.attempt()).oldValue(AuditValues.canonical(before.fields()))
                    .newValue(AuditValues.canonical(after)).build());
            return null;
        });
    }

    @Override
    public void fail(Session actor, WorkUnitLease lease, String error) {
        if (error == null || error.isBlank()) {
            throw new IllegalArgumentException("error must say why work unit " + name(lease) + " failed, was "
                    + error);
        }
        String failure = error.length() > MAX_TEXT_LENGTH ? error.substring(0, MAX_TEXT_LENGTH) : error;
        transactions.run("marking work unit " + name(lease) + " failed", tx -> {
            requireBatchAccess(tx, actor, lease.batchId(), AccessLevel.WRITE);
            Unit before = lockOwn(tx, lease, "fail");
            Instant at = databaseTime(tx);
            tx.update("UPDATE work_unit SET state = 'FAILED', lease_until = NULL, done_at = ?, failure = ?"
                    + " WHERE batch_id = ? AND seq = ?", at, failure, lease.batchId(), lease.seq());
            Map<String, Object> after = new LinkedHashMap<>();
            after.put("state", "FAILED");
            after.put("claimedBy", lease.runnerId());
            after.put("attempt", lease.attempt());
            after.put("doneAt", at);
            after.put("failure", failure);
            tx.audit(AuditEntry.builder(actor.userId(), AuditAction.CHANGE, "work-unit", lease.unitName())
                    .version(lease.attempt()).oldValue(AuditValues.canonical(before.fields()))
                    .newValue(AuditValues.canonical(after)).build());
            return null;
        });
    }

    @Override
    public List<FailedUnit> failures(Session actor, String batchId) {
        return transactions.run("reading the failed units of work batch " + batchId, tx -> {
            requireBatchAccess(tx, actor, batchId, AccessLevel.READ);
            return tx.queryList("SELECT seq, payload, failure FROM work_unit WHERE batch_id = ? AND state = 'FAILED'"
                    + " ORDER BY seq", rs -> new FailedUnit(rs.getInt(1), rs.getString(2), rs.getString(3)), batchId);
        });
    }

    @Override
    public List<StoredMeasurement> complete(Session actor, WorkUnitLease lease, List<ProcessedSpectrum> block) {
        JdbcBlockService.requireEntries(block);
        return transactions.run("completing work unit " + name(lease) + " with " + block.size()
                + " processed spectra", tx -> {
                    String projectId = requireBatchAccess(tx, actor, lease.batchId(), AccessLevel.WRITE);
                    Unit before = lockOwn(tx, lease, "complete");
                    JdbcBlockService.Written written = block.isEmpty()
                            ? new JdbcBlockService.Written(List.of(), List.of(), List.of(), 0)
                            : JdbcBlockService.insert(tx, versions, actor, projectId, block);
                    List<String> measurementIds = written.stored().stream().map(StoredMeasurement::measurementId)
                            .toList();
                    try (PreparedStatement ps = tx.connection().prepareStatement("INSERT INTO work_unit_measurement"
                            + " (measurement_id, batch_id, seq) VALUES (?, ?, ?)")) {
                        for (String id : measurementIds) {
                            Tx.bind(ps, id, lease.batchId(), lease.seq());
                            ps.addBatch();
                        }
                        if (!measurementIds.isEmpty()) {
                            ps.executeBatch();
                        }
                    }
                    Instant done = databaseTime(tx);
                    tx.update("UPDATE work_unit SET state = 'DONE', lease_until = NULL, done_at = ?"
                            + " WHERE batch_id = ? AND seq = ?", done, lease.batchId(), lease.seq());
                    Map<String, Object> after = new LinkedHashMap<>();
                    after.put("state", "DONE");
                    after.put("claimedBy", lease.runnerId());
                    after.put("attempt", lease.attempt());
                    after.put("doneAt", done);
                    after.put("measurements", measurementIds.size());
                    after.put("measurementIds", String.join(",", measurementIds));
                    after.put("results", written.resultCount());
                    List<AuditEntry> audit = new ArrayList<>(written.audit());
                    List<List<RowBindings.RowRef>> rows = new ArrayList<>(written.rows());
                    rows.add(List.of());
                    audit.add(AuditEntry.builder(actor.userId(), AuditAction.CHANGE, "work-unit", lease.unitName())
                            .version(lease.attempt()).oldValue(AuditValues.canonical(before.fields()))
                            .newValue(AuditValues.canonical(after)).build());
                    tx.auditAll(audit, rows);
                    return written.stored();
                });
    }

    /**
     * Locks the unit and checks that the lease's claim is still the current one.
     *
     * @throws LeaseLostException naming who holds the unit now
     */
    private static Unit lockOwn(Tx tx, WorkUnitLease lease, String action) throws SQLException {
        Unit unit = tx.queryOne("SELECT " + UNIT_COLUMNS + " FROM work_unit WHERE batch_id = ? AND seq = ?"
                + " FOR UPDATE", Unit::read, lease.batchId(), lease.seq())
                .orElseThrow(() -> new NoSuchObjectException("work unit", lease.unitName()));
        if (!"CLAIMED".equals(unit.state()) || unit.attempt() != lease.attempt()
                || !lease.runnerId().equals(unit.claimedBy())) {
            throw new LeaseLostException("runner " + lease.runnerId() + " may not " + action + " work unit "
                    + lease.unitName() + ": its claim (attempt " + lease.attempt() + ") is no longer current; the"
                    + " unit is " + unit.state() + (unit.claimedBy() == null ? "" : " by " + unit.claimedBy())
                    + " at attempt " + unit.attempt() + "; nothing was written");
        }
        return unit;
    }

    @Override
    public WorkBatch batch(Session actor, String batchId) {
        return transactions.run("reading work batch " + batchId, tx -> {
            String projectId = requireBatchAccess(tx, actor, batchId, AccessLevel.READ);
            WorkBatch batch = tx.queryOne("SELECT " + BATCH_COLUMNS + " FROM work_batch b WHERE b.id = ?",
                    JdbcWorkUnitService::readBatch, batchId).orElseThrow();
            return inProject(tx, projectId, batch);
        });
    }

    @Override
    public Optional<WorkBatch> unfinishedBatch(Session actor, String projectId, String methodVersionId) {
        return transactions.run("looking for an unfinished work batch of project " + projectId
                + " and method version " + methodVersionId, tx -> {
                    Guard.requireProject(tx, actor, projectId, AccessLevel.READ);
                    return findUnfinished(tx, projectId, methodVersionId);
                });
    }

    @Override
    public List<WorkBatch> batches(Session actor, String projectId) {
        return transactions.run("reading the work batches of project " + projectId, tx -> {
            Guard.requireProject(tx, actor, projectId, AccessLevel.READ);
            List<WorkBatch> read = tx.queryList("SELECT " + BATCH_COLUMNS + " FROM work_batch b"
                    + " WHERE b.project_id = ? ORDER BY b.created_at, b.id", JdbcWorkUnitService::readBatch, projectId);
            ModelRows.project(tx, projectId).getBatches().addAll(read);
            return read;
        });
    }

    private static Optional<WorkBatch> findUnfinished(Tx tx, String projectId, String methodVersionId)
            throws SQLException {
        Optional<WorkBatch> found = tx.queryOne("SELECT " + BATCH_COLUMNS + " FROM work_batch b"
                + " WHERE b.project_id = ? AND b.method_version_id = ? AND EXISTS (SELECT 1 FROM work_unit u"
                + " WHERE u.batch_id = b.id AND u.state IN ('OPEN', 'CLAIMED')) ORDER BY b.created_at, b.id LIMIT 1",
                JdbcWorkUnitService::readBatch, projectId, methodVersionId);
        return found.isEmpty() ? found : Optional.of(inProject(tx, projectId, found.get()));
    }

    private static UnfinishedBatchException refusal(Tx tx, WorkBatch other) throws SQLException {
        long notDone = tx.queryOne("SELECT COUNT(*) FROM work_unit WHERE batch_id = ?"
                + " AND state IN ('OPEN', 'CLAIMED')",
                rs -> rs.getLong(1), other.getId()).orElseThrow();
        return new UnfinishedBatchException(other.getId(), "project " + other.getProject().getCode()
                + " has the unfinished work batch " + other.getId() + " of method version "
                + other.getMethodVersionId() + " (" + notDone + " of " + other.getUnitCount()
                + " units not done, recorded " + other.getCreatedAt() + "): another batch of that version would"
                + " store the same samples again; work batch " + other.getId() + " to the end instead;"
                + " nothing was written");
    }

    private static void requireMethodVersion(Tx tx, String methodVersionId) throws SQLException {
        if (tx.queryOne("SELECT v.id FROM content_version v JOIN versioned_item i ON i.id = v.item_id"
                + " WHERE v.id = ? AND i.kind = 'METHOD'", rs -> rs.getString(1), methodVersionId).isEmpty()) {
            throw new NoSuchObjectException("METHOD version", methodVersionId);
        }
    }

    /** The batch of the row, not yet in its project (read after the row, not while its query is open). */
    private static WorkBatch readBatch(ResultSet rs) throws SQLException {
        WorkBatch batch = FACTORY.createWorkBatch();
        batch.setId(rs.getString("id"));
        batch.setMethodVersionId(rs.getString("method_version_id"));
        batch.setDescription(rs.getString("description"));
        batch.setUnitCount(rs.getInt("unit_count"));
        batch.setCreatedBy(rs.getString("created_by"));
        batch.setCreatedAt(Tx.instant(rs, "created_at"));
        return batch;
    }

    /** @return the batch, put into its project as {@link ModelRows#project} reads it */
    private static WorkBatch inProject(Tx tx, String projectId, WorkBatch batch) throws SQLException {
        ModelRows.project(tx, projectId).getBatches().add(batch);
        return batch;
    }

    @Override
    public BatchProgress progress(Session actor, String batchId) {
        return transactions.run("reading the progress of work batch " + batchId, tx -> {
            requireBatchAccess(tx, actor, batchId, AccessLevel.READ);
            int[] counts = new int[4];
            for (Object[] row : tx.queryList("SELECT state, COUNT(*) FROM work_unit WHERE batch_id = ?"
                    + " GROUP BY state", rs -> new Object[] {rs.getString(1), rs.getInt(2)}, batchId)) {
                int index = switch ((String) row[0]) {
                    case "OPEN" -> 0;
                    case "CLAIMED" -> 1;
                    case "DONE" -> 2;
                    default -> 3;
                };
                counts[index] = (Integer) row[1];
            }
            return new BatchProgress(counts[0], counts[1], counts[2], counts[3]);
        });
    }

    @Override
    public List<String> measurementsOf(Session actor, String batchId, int seq) {
        return transactions.run("reading the measurements of work unit " + batchId + "/" + seq, tx -> {
            requireBatchAccess(tx, actor, batchId, AccessLevel.READ);
            return tx.queryList("SELECT m.id FROM work_unit_measurement w JOIN measurement m ON m.id ="
                    + " w.measurement_id WHERE w.batch_id = ? AND w.seq = ? ORDER BY m.measured_at, m.id",
                    rs -> rs.getString(1), batchId, seq);
        });
    }

    /** @return the batch's project */
    private static String requireBatchAccess(Tx tx, Session actor, String batchId, AccessLevel needed)
            throws SQLException {
        return Guard.requireProjectOf(tx, actor, "work_batch", "work batch", batchId, needed);
    }

    /** The database's time, so that the runners' clocks do not matter. */
    private static Instant databaseTime(Tx tx) throws SQLException {
        return tx.queryOne("SELECT CURRENT_TIMESTAMP", rs -> rs.getObject(1, OffsetDateTime.class).toInstant())
                .orElseThrow().truncatedTo(ChronoUnit.MICROS);
    }

    private static String name(WorkUnitLease lease) {
        if (lease == null) {
            throw new IllegalArgumentException("lease must not be null");
        }
        return lease.unitName();
    }

    private static void requireRunner(String runnerId) {
        if (runnerId == null || runnerId.isBlank() || runnerId.length() > 200) {
            throw new IllegalArgumentException("runnerId must be non-blank text of at most 200 characters, was "
                    + runnerId);
        }
    }

    private static void requireLease(String field, Duration lease) {
        if (lease == null || lease.isNegative() || lease.isZero()) {
            throw new IllegalArgumentException(field + " must be a positive duration, was " + lease);
        }
    }
}
