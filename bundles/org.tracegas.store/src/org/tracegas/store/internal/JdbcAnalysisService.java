package org.tracegas.store.internal;

import java.nio.charset.StandardCharsets;
import java.sql.PreparedStatement;
import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

import org.tracegas.audit.AuditAction;
import org.tracegas.audit.AuditEntry;
import org.tracegas.audit.AuditValues;
import org.tracegas.model.AccessLevel;
import org.tracegas.model.Result;
import org.tracegas.model.SpectralContent;
import org.tracegas.store.AnalysisService;
import org.tracegas.store.MeasurementAnalysis;
import org.tracegas.store.NoSuchObjectException;
import org.tracegas.store.ResultRow;
import org.tracegas.store.Session;
import org.tracegas.store.SpectrumInput;
import org.tracegas.store.StoredMeasurement;

final class JdbcAnalysisService implements AnalysisService {

    private final Transactions transactions;

    private final JdbcVersionService versions;

    JdbcAnalysisService(Transactions transactions, JdbcVersionService versions) {
        this.transactions = transactions;
        this.versions = versions;
    }

    @Override
    public List<StoredMeasurement> store(Session actor, String projectId, List<MeasurementAnalysis> analyses) {
        if (analyses == null || analyses.isEmpty()) {
            throw new IllegalArgumentException("analyses must hold at least one analysis");
        }
        for (int i = 0; i < analyses.size(); i++) {
            if (analyses.get(i) == null) {
                throw new IllegalArgumentException("analyses[" + i + "] is null");
            }
        }
        return transactions.run("storing " + analyses.size() + " analyses in project " + projectId, tx -> {
            Guard.requireProject(tx, actor, projectId, AccessLevel.WRITE);
            Set<String> checked = new HashSet<>();
            for (int i = 0; i < analyses.size(); i++) {
                MeasurementAnalysis a = analyses.get(i);
                if (tx.queryOne("SELECT 1 FROM measurement WHERE id = ? AND project_id = ?", rs -> 1,
                        a.measurementId(), projectId).isEmpty()) {
                    throw new IllegalArgumentException("analyses[" + i + "].measurementId " + a.measurementId()
                            + " is not a measurement of project " + projectId);
                }
                for (int j = 0; j < a.results().size(); j++) {
                    JdbcResultService.requireVersions(tx, versions, a.results().get(j), checked,
                            "analyses[" + i + "].results[" + j + "].");
                }
            }
            Instant recorded = Instant.now().truncatedTo(ChronoUnit.MICROS);
            List<StoredMeasurement> stored = new ArrayList<>(analyses.size());
            List<AuditEntry> audit = new ArrayList<>(analyses.size());
            List<List<RowBindings.RowRef>> bound = new ArrayList<>(analyses.size());
            for (MeasurementAnalysis a : analyses) {
                List<RowBindings.RowRef> written = new ArrayList<>();
                String recipeSha = SpectrumCodec.sha256Hex(a.recipe().getBytes(StandardCharsets.UTF_8));
                if (tx.queryOne("SELECT 1 FROM processing_recipe WHERE sha256 = ?", rs -> 1, recipeSha).isEmpty()) {
                    tx.update("INSERT INTO processing_recipe (sha256, text) VALUES (?, ?)", recipeSha, a.recipe());
                    written.add(new RowBindings.RowRef(DataKind.PROCESSING_RECIPE, recipeSha));
                }
                String[] spectrum;
                try (PreparedStatement ps = tx.connection().prepareStatement(SpectrumRows.INSERT)) {
                    spectrum = SpectrumRows.bindInsert(ps, projectId, new SpectrumInput(a.measurementId(),
                            SpectralContent.ABSORBANCE, a.absorbance(), a.encoding()));
                    ps.executeUpdate();
                }
                List<Result> rows = new ArrayList<>(a.results().size());
                try (PreparedStatement ps = tx.connection().prepareStatement(JdbcResultService.INSERT)) {
                    for (Result r : a.results()) {
                        Result row = JdbcResultService.stored(r, projectId, a.measurementId(), actor, recorded);
                        DataKind.RESULT.bind(ps, JdbcResultService.row(row, recipeSha));
                        ps.addBatch();
                        rows.add(row);
                    }
                    ps.executeBatch();
                }
                List<String> resultIds = rows.stream().map(Result::getId).toList();
                stored.add(new StoredMeasurement(a.measurementId(), spectrum[0], resultIds));
                Map<String, Object> fields = new java.util.LinkedHashMap<>();
                fields.put("project", projectId);
                fields.put("recipeSha256", recipeSha);
                fields.put("spectrum", spectrum[0]);
                fields.put("spectrumContent", SpectralContent.ABSORBANCE.getName());
                fields.put("spectrumAxis", a.absorbance().axis());
                fields.put("spectrumEncoding", a.encoding());
                fields.put("spectrumSha256", spectrum[1]);
                fields.put("results", resultIds.size());
                fields.put("resultIds", String.join(",", resultIds));
                fields.put("resultsSha256", JdbcBlockService.resultsSha256(rows));
                audit.add(AuditEntry.builder(actor.userId(), AuditAction.CREATE, "measurement-analysis",
                        a.measurementId()).newValue(AuditValues.canonical(fields)).build());
                written.add(new RowBindings.RowRef(DataKind.SPECTRAL_DATA, spectrum[0]));
                resultIds.forEach(id -> written.add(new RowBindings.RowRef(DataKind.RESULT, id)));
                bound.add(written);
            }
            tx.auditAll(audit, bound);
            return stored;
        });
    }

    @Override
    public Set<String> analysed(Session actor, String projectId, String methodVersionId) {
        return transactions.run("reading the analysed measurements of project " + projectId, tx -> {
            Guard.requireProject(tx, actor, projectId, AccessLevel.READ);
            return new LinkedHashSet<>(tx.queryList("SELECT DISTINCT measurement_id FROM analysis_result"
                    + " WHERE project_id = ? AND method_version_id = ? AND measurement_id IS NOT NULL",
                    rs -> rs.getString(1), projectId, methodVersionId));
        });
    }

    @Override
    public List<ResultRow> rows(Session actor, String projectId) {
        return transactions.run("reading the results of project " + projectId, tx -> {
            Guard.requireProject(tx, actor, projectId, AccessLevel.READ);
            return tx.queryList("SELECT r.*, m.measured_at, f.file_name FROM analysis_result r"
                    + " LEFT JOIN measurement m ON m.id = r.measurement_id"
                    + " LEFT JOIN imported_measurement i ON i.measurement_id = r.measurement_id"
                    + " LEFT JOIN raw_file f ON f.project_id = i.project_id AND f.sha256 = i.raw_sha256"
                    + " WHERE r.project_id = ? ORDER BY m.measured_at, r.measurement_id, r.recorded_at, r.compound, r.id",
                    rs -> {
                        String recipe = rs.getString("recipe_sha256");
                        return new ResultRow(JdbcResultService.map(rs), Tx.instant(rs, "measured_at"),
                                rs.getString("file_name"), recipe == null ? null : recipe.trim());
                    }, projectId);
        });
    }

    @Override
    public String recipe(Session actor, String sha256) {
        return transactions.run("reading recipe " + sha256, tx -> {
            Guard.roles(tx, actor);
            return tx.queryOne("SELECT text FROM processing_recipe WHERE sha256 = ?", rs -> rs.getString(1), sha256)
                    .orElseThrow(() -> new NoSuchObjectException("processing recipe", sha256));
        });
    }

}
