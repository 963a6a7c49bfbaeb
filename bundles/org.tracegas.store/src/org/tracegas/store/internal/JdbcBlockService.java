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

import org.tracegas.audit.AuditAction;
import org.tracegas.audit.AuditEntry;
import org.tracegas.audit.AuditValues;
import org.tracegas.model.AccessLevel;
import org.tracegas.model.Result;
import org.tracegas.model.SpectralContent;
import org.tracegas.store.BlockService;
import org.tracegas.store.EncodedBlock;
import org.tracegas.store.NoSuchObjectException;
import org.tracegas.store.ProcessedSpectrum;
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

    /**
     * A block as {@link #encode} made it: the rows by table, each by column name as it is inserted, and what
     * inserting them writes, with every bound row's hash taken from those values.
     */
    record Encoded(Session actor, String projectId, List<ProcessedSpectrum> block,
            List<Map<String, Object>> measurements, List<Map<String, Object>> spectra,
            List<Map<String, Object>> results, List<Map<String, Object>> instruments, Written written)
            implements EncodedBlock {

        @Override
        public int size() {
            return block.size();
        }
    }

    /** A measurement's link to the instrument that made it. */
    private static final String INSERT_INSTRUMENT = DataKind.MEASUREMENT_INSTRUMENT.insert();

    private final Transactions transactions;
    private final JdbcVersionService versions;

    JdbcBlockService(Transactions transactions, JdbcVersionService versions) {
        this.transactions = transactions;
        this.versions = versions;
    }

    @Override
    public List<StoredMeasurement> store(Session actor, String projectId, List<ProcessedSpectrum> block) {
        return store(encode(actor, projectId, block));
    }

    @Override
    public EncodedBlock encode(Session actor, String projectId, List<ProcessedSpectrum> block) {
        if (actor == null) {
            throw new IllegalArgumentException("actor must not be null");
        }
        if (projectId == null) {
            throw new IllegalArgumentException("projectId must not be null");
        }
        requireEntries(block);
        if (block.isEmpty()) {
            throw new IllegalArgumentException("block must hold at least one processed spectrum");
        }
        return encodeRows(actor, projectId, block);
    }

    @Override
    public List<StoredMeasurement> store(EncodedBlock block) {
        if (!(block instanceof Encoded encoded)) {
            throw new IllegalArgumentException("block: not encoded by this store's encode, was " + block);
        }
        return transactions.run("storing a block of " + encoded.size() + " processed spectra in project "
                + encoded.projectId(), tx -> {
                    Guard.requireProject(tx, encoded.actor(), encoded.projectId(), AccessLevel.WRITE);
                    Written written = insert(tx, versions, encoded);
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

    /** As {@link #insert(Tx, JdbcVersionService, Encoded)}, encoding the block first. */
    static Written insert(Tx tx, JdbcVersionService versions, Session actor, String projectId,
            List<ProcessedSpectrum> block) throws SQLException {
        return insert(tx, versions, encodeRows(actor, projectId, block));
    }

    /**
     * Inserts measurements, spectra, results and the measurements' links to their instrument of an encoded block
     * with one JDBC batch per table. The audit records are returned, not appended, so that the caller appends
     * them last: the audit chain head stays locked only for the end of the transaction.
     *
     * @throws NoSuchObjectException naming the index of a spectrum whose instrument is not stored
     */
    static Written insert(Tx tx, JdbcVersionService versions, Encoded encoded) throws SQLException {
        Set<String> checked = new HashSet<>();
        Set<String> instruments = new HashSet<>();
        List<ProcessedSpectrum> block = encoded.block();
        for (int i = 0; i < block.size(); i++) {
            List<Result> results = block.get(i).results();
            for (int j = 0; j < results.size(); j++) {
                JdbcResultService.requireVersions(tx, versions, results.get(j), checked,
                        "block[" + i + "].results[" + j + "].");
            }
            // a stream's spectra name one instrument: it is looked up once per block
            String instrument = block.get(i).instrumentId();
            if (instrument != null && instruments.add(instrument)
                    && tx.queryOne("SELECT 1 FROM instrument WHERE id = ?", rs -> 1, instrument).isEmpty()) {
                throw new NoSuchObjectException("instrument (block[" + i + "].instrumentId)", instrument);
            }
        }
        insertAll(tx, JdbcProjectService.INSERT_MEASUREMENT, DataKind.MEASUREMENT, encoded.measurements());
        insertAll(tx, SpectrumRows.INSERT, DataKind.SPECTRAL_DATA, encoded.spectra());
        insertAll(tx, JdbcResultService.INSERT, DataKind.RESULT, encoded.results());
        insertAll(tx, INSERT_INSTRUMENT, DataKind.MEASUREMENT_INSTRUMENT, encoded.instruments());
        return encoded.written();
    }

    private static void insertAll(Tx tx, String insert, DataKind kind, List<Map<String, Object>> rows)
            throws SQLException {
        if (rows.isEmpty()) {
            return;
        }
        try (PreparedStatement ps = tx.connection().prepareStatement(insert)) {
            for (Map<String, Object> row : rows) {
                kind.bind(ps, row);
                ps.addBatch();
            }
            ps.executeBatch();
        }
    }

    /**
     * Assigns the ids, encodes the rows as they are inserted and hashes them, and makes the audit records:
     * everything but the database work, so that it can run on any thread before the transaction.
     */
    private static Encoded encodeRows(Session actor, String projectId, List<ProcessedSpectrum> block) {
        Instant recorded = Instant.now().truncatedTo(ChronoUnit.MICROS);
        List<Map<String, Object>> measurementRows = new ArrayList<>(block.size());
        List<Map<String, Object>> spectrumRows = new ArrayList<>(block.size());
        List<Map<String, Object>> resultRows = new ArrayList<>();
        List<Map<String, Object>> instrumentRows = new ArrayList<>();
        List<StoredMeasurement> stored = new ArrayList<>(block.size());
        List<AuditEntry> audit = new ArrayList<>(block.size());
        List<List<RowBindings.RowRef>> rows = new ArrayList<>(block.size());
        for (ProcessedSpectrum p : block) {
            String measurementId = RowIds.next();
            // stored to the microsecond, the precision both databases keep, so the hash is that of the row
            Instant time = p.time().truncatedTo(ChronoUnit.MICROS);
            Map<String, Object> measurement = JdbcProjectService.measurementRow(measurementId, projectId, p.kind(),
                    time, p.cellTemperature(), p.cellPressure(), actor.userId());
            Map<String, Object> spectrum = SpectrumRows.row(projectId, new SpectrumInput(measurementId,
                    SpectralContent.ABSORBANCE, p.absorbance(), p.encoding()));
            String spectrumId = (String) spectrum.get("id");
            List<Result> results = new ArrayList<>(p.results().size());
            List<RowBindings.RowRef> bound = new ArrayList<>(3 + p.results().size());
            bound.add(new RowBindings.RowRef(DataKind.MEASUREMENT, measurementId,
                    DataKind.MEASUREMENT.sha256(measurement)));
            bound.add(new RowBindings.RowRef(DataKind.SPECTRAL_DATA, spectrumId,
                    DataKind.SPECTRAL_DATA.sha256(spectrum)));
            for (Result r : p.results()) {
                Result result = JdbcResultService.stored(r, projectId, measurementId, actor, recorded);
                Map<String, Object> row = JdbcResultService.row(result, null);
                results.add(result);
                resultRows.add(row);
                bound.add(new RowBindings.RowRef(DataKind.RESULT, result.getId(), DataKind.RESULT.sha256(row)));
            }
            if (p.instrumentId() != null) {
                Map<String, Object> link = Map.of("measurement_id", measurementId, "instrument_id",
                        p.instrumentId());
                instrumentRows.add(link);
                bound.add(new RowBindings.RowRef(DataKind.MEASUREMENT_INSTRUMENT, measurementId,
                        DataKind.MEASUREMENT_INSTRUMENT.sha256(link)));
            }
            measurementRows.add(measurement);
            spectrumRows.add(spectrum);
            List<String> resultIds = results.stream().map(Result::getId).toList();
            stored.add(new StoredMeasurement(measurementId, spectrumId, resultIds));
            Map<String, Object> fields = JdbcProjectService.measurementValues(projectId, p.kind(), p.time(),
                    p.cellTemperature(), p.cellPressure());
            fields.put("spectrum", spectrumId);
            fields.put("spectrumContent", SpectralContent.ABSORBANCE.getName());
            fields.put("spectrumAxis", p.absorbance().axis());
            fields.put("spectrumEncoding", p.encoding());
            fields.put("spectrumSha256", spectrum.get("sha256"));
            fields.put("results", resultIds.size());
            fields.put("resultIds", String.join(",", resultIds));
            fields.put("resultsSha256", resultsSha256(results));
            if (p.instrumentId() != null) {
                fields.put("instrument", p.instrumentId());
            }
            audit.add(AuditEntry.builder(actor.userId(), AuditAction.CREATE, "measurement", measurementId)
                    .newValue(AuditValues.canonical(fields)).build());
            rows.add(bound);
        }
        return new Encoded(actor, projectId, List.copyOf(block), measurementRows, spectrumRows, resultRows,
                instrumentRows, new Written(List.copyOf(stored), audit, rows, resultRows.size()));
    }

    /** As documented on {@link BlockService}: an auditor recomputes it from the stored results. */
    static String resultsSha256(List<Result> results) {
        StringBuilder text = new StringBuilder();
        for (Result r : results) {
            Map<String, Object> fields = new LinkedHashMap<>(JdbcResultService.fields(r));
            fields.put("id", r.getId());
            text.append(AuditValues.canonical(fields));
        }
        return SpectrumCodec.sha256Hex(text.toString().getBytes(StandardCharsets.UTF_8));
    }
}
