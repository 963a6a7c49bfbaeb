package org.tracegas.store.internal;

import java.nio.charset.StandardCharsets;
import java.sql.PreparedStatement;
import java.sql.SQLException;
import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.UUID;

import org.tracegas.audit.AuditAction;
import org.tracegas.audit.AuditEntry;
import org.tracegas.audit.AuditValues;
import org.tracegas.model.AccessLevel;
import org.tracegas.model.SpectralContent;
import org.tracegas.store.BlockService;
import org.tracegas.store.NewResult;
import org.tracegas.store.ProcessedSpectrum;
import org.tracegas.store.ResultInfo;
import org.tracegas.store.Session;
import org.tracegas.store.SpectrumInput;
import org.tracegas.store.StoredMeasurement;

final class JdbcBlockService implements BlockService {

    /**
     * What inserting a block wrote, and the audit records the caller appends before committing, each with the
     * rows it vouches for.
     */
    record Written(List<StoredMeasurement> stored, List<AuditEntry> audit, List<List<RowBindings.RowRef>> rows,
            int resultCount) {
    }

    private final Transactions transactions;

    JdbcBlockService(Transactions transactions) {
        this.transactions = transactions;
    }

    @Override
    public List<StoredMeasurement> store(Session actor, String projectId, List<ProcessedSpectrum> block) {
        requireEntries(block);
        if (block.isEmpty()) {
            throw new IllegalArgumentException("block must hold at least one processed spectrum");
        }
        return transactions.run("storing a block of " + block.size() + " processed spectra in project " + projectId,
                tx -> {
                    Guard.requireProject(tx, actor, projectId, AccessLevel.WRITE);
                    Written written = insert(tx, actor, projectId, block);
                    tx.auditAll(written.audit(), written.rows());
                    return written.stored();
                });
    }

    /** @throws IllegalArgumentException if the block or one of its entries is null, naming the index */
    static void requireEntries(List<ProcessedSpectrum> block) {
        if (block == null) {
            throw new IllegalArgumentException("block must not be null");
        }
        for (int i = 0; i < block.size(); i++) {
            if (block.get(i) == null) {
                throw new IllegalArgumentException("block[" + i + "] is null");
            }
        }
    }

    /**
     * Inserts measurements, spectra and results of a block with one JDBC batch per table. The audit records
     * are returned, not appended, so that the caller appends them last: the audit chain head stays locked
     * only for the end of the transaction.
     */
    static Written insert(Tx tx, Session actor, String projectId, List<ProcessedSpectrum> block)
            throws SQLException {
        Set<String> checked = new HashSet<>();
        for (int i = 0; i < block.size(); i++) {
            List<NewResult> results = block.get(i).results();
            for (int j = 0; j < results.size(); j++) {
                JdbcResultService.requireVersions(tx, results.get(j), checked,
                        "block[" + i + "].results[" + j + "].");
            }
        }
        Instant recorded = Instant.now().truncatedTo(ChronoUnit.MICROS);
        List<String> measurementIds = new ArrayList<>(block.size());
        try (PreparedStatement ps = tx.connection().prepareStatement(JdbcProjectService.INSERT_MEASUREMENT)) {
            for (ProcessedSpectrum p : block) {
                String id = UUID.randomUUID().toString();
                measurementIds.add(id);
                Tx.bind(ps, id, projectId, p.kind(), p.time(), p.cellTemperature(), p.cellPressure(),
                        actor.userId());
                ps.addBatch();
            }
            ps.executeBatch();
        }
        List<String[]> spectra = new ArrayList<>(block.size());
        try (PreparedStatement ps = tx.connection().prepareStatement(SpectrumRows.INSERT)) {
            for (int i = 0; i < block.size(); i++) {
                ProcessedSpectrum p = block.get(i);
                spectra.add(SpectrumRows.bindInsert(ps, projectId, new SpectrumInput(measurementIds.get(i),
                        SpectralContent.ABSORBANCE, p.absorbance(), p.encoding())));
                ps.addBatch();
            }
            ps.executeBatch();
        }
        List<List<ResultInfo>> results = new ArrayList<>(block.size());
        int resultCount = 0;
        try (PreparedStatement ps = tx.connection().prepareStatement(JdbcResultService.INSERT)) {
            for (int i = 0; i < block.size(); i++) {
                List<ResultInfo> rows = new ArrayList<>();
                for (NewResult r : block.get(i).results()) {
                    ResultInfo row = JdbcResultService.newInfo(actor, projectId,
                            r.withMeasurement(measurementIds.get(i)), recorded);
                    JdbcResultService.bindInsert(ps, row);
                    ps.addBatch();
                    rows.add(row);
                }
                results.add(rows);
                resultCount += rows.size();
            }
            if (resultCount > 0) {
                ps.executeBatch();
            }
        }
        List<StoredMeasurement> stored = new ArrayList<>(block.size());
        List<AuditEntry> audit = new ArrayList<>(block.size());
        List<List<RowBindings.RowRef>> rows = new ArrayList<>(block.size());
        for (int i = 0; i < block.size(); i++) {
            ProcessedSpectrum p = block.get(i);
            List<String> resultIds = results.get(i).stream().map(ResultInfo::id).toList();
            stored.add(new StoredMeasurement(measurementIds.get(i), spectra.get(i)[0], resultIds));
            Map<String, Object> fields = JdbcProjectService.measurementValues(projectId, p.kind(), p.time(),
                    p.cellTemperature(), p.cellPressure());
            fields.put("spectrum", spectra.get(i)[0]);
            fields.put("spectrumContent", SpectralContent.ABSORBANCE.getName());
            fields.put("spectrumAxis", p.absorbance().axis());
            fields.put("spectrumEncoding", p.encoding());
            fields.put("spectrumSha256", spectra.get(i)[1]);
            fields.put("results", resultIds.size());
            fields.put("resultIds", String.join(",", resultIds));
            fields.put("resultsSha256", resultsSha256(results.get(i)));
            audit.add(AuditEntry.builder(actor.userId(), AuditAction.CREATE, "measurement", measurementIds.get(i))
                    .newValue(AuditValues.canonical(fields)).build());
            List<RowBindings.RowRef> bound = new ArrayList<>(2 + resultIds.size());
            bound.add(new RowBindings.RowRef(DataKind.MEASUREMENT, measurementIds.get(i)));
            bound.add(new RowBindings.RowRef(DataKind.SPECTRAL_DATA, spectra.get(i)[0]));
            for (String id : resultIds) {
                bound.add(new RowBindings.RowRef(DataKind.RESULT, id));
            }
            rows.add(bound);
        }
        return new Written(List.copyOf(stored), audit, rows, resultCount);
    }

    /** As documented on {@link BlockService}: an auditor recomputes it from the stored results. */
    static String resultsSha256(List<ResultInfo> results) {
        StringBuilder text = new StringBuilder();
        for (ResultInfo r : results) {
            Map<String, Object> fields = new LinkedHashMap<>(JdbcResultService.fields(r));
            fields.put("id", r.id());
            text.append(AuditValues.canonical(fields));
        }
        return SpectrumCodec.sha256Hex(text.toString().getBytes(StandardCharsets.UTF_8));
    }
}
