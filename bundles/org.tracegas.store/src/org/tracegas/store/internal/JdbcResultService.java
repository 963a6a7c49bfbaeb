package org.tracegas.store.internal;

import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.Collections;
import java.util.EnumSet;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.stream.Collectors;

import org.tracegas.audit.AuditAction;
import org.tracegas.audit.AuditEntry;
import org.tracegas.audit.AuditValues;
import org.tracegas.model.AccessLevel;
import org.tracegas.model.Provenance;
import org.tracegas.model.Result;
import org.tracegas.model.ResultConditions;
import org.tracegas.model.ResultFlag;
import org.tracegas.model.Results;
import org.tracegas.model.VersionKind;
import org.tracegas.store.ResultChecks;
import org.tracegas.store.ResultService;
import org.tracegas.store.Session;

final class JdbcResultService implements ResultService {

    private final Transactions transactions;
    private final JdbcVersionService versions;

    JdbcResultService(Transactions transactions, JdbcVersionService versions) {
        this.transactions = transactions;
        this.versions = versions;
    }

    @Override
    public Result record(Session actor, String projectId, Result result) {
        ResultChecks.requireComplete(result, "");
        return recordAll(actor, projectId, Collections.singletonList(result)).get(0);
    }

    @Override
    public List<Result> recordAll(Session actor, String projectId, List<Result> results) {
        if (results == null || results.isEmpty()) {
            throw new IllegalArgumentException("results must hold at least one result");
        }
        for (int i = 0; i < results.size(); i++) {
            ResultChecks.requireComplete(results.get(i), "results[" + i + "].");
        }
        return transactions.run("recording " + results.size() + " result(s) in project " + projectId, tx -> {
            Guard.requireProject(tx, actor, projectId, AccessLevel.WRITE);
            Set<String> checked = new HashSet<>();
            List<Result> stored = new ArrayList<>(results.size());
            for (Result result : results) {
                stored.add(insert(tx, actor, projectId, result, checked));
            }
            return stored;
        });
    }

    /** The insert of a result; the recipe that processed its spectrum, if any, is written with the row. */
    static final String INSERT = DataKind.RESULT.insert("row_version", "0");

    /** @param checked versions and measurements already checked and frozen in this transaction */
    private Result insert(Tx tx, Session actor, String projectId, Result result, Set<String> checked)
            throws SQLException {
        requireVersions(tx, versions, result, checked, "");
        String measurementId = result.getMeasurementId();
        if (measurementId != null && checked.add("measurement:" + measurementId)
                && tx.queryOne("SELECT 1 FROM measurement WHERE id = ? AND project_id = ?", rs -> 1,
                        measurementId, projectId).isEmpty()) {
            throw new IllegalArgumentException("measurementId " + measurementId
                    + " is not a measurement of project " + projectId);
        }
        Result stored = stored(result, projectId, measurementId, actor,
                Instant.now().truncatedTo(ChronoUnit.MICROS));
        try (PreparedStatement ps = tx.connection().prepareStatement(INSERT)) {
            DataKind.RESULT.bind(ps, row(stored, null));
            ps.executeUpdate();
        }
        tx.wrote(DataKind.RESULT, stored.getId());
        tx.audit(AuditEntry.builder(actor.userId(), AuditAction.CREATE, "result", stored.getId())
                .newValue(values(stored)).build());
        return stored;
    }

    /**
     * The result as it is stored: a new object with the given one's values, a new id, and project, measurement,
     * recording user and time; the given result stays as it was.
     */
    static Result stored(Result values, String projectId, String measurementId, Session actor, Instant recorded) {
        Result stored = Results.of(measurementId, values.getCompound(), values.getConcentration(),
                values.getStandardUncertainty(), values.getDetectionLimit(), values.getUnit(), values.getFlags(),
                values.getProvenance(), values.getConditions());
        stored.setId(RowIds.next());
        stored.setProjectId(projectId);
        stored.setRecordedBy(actor.userId());
        stored.setRecorded(recorded);
        return stored;
    }

    /**
     * A result's row by column name, as {@link DataKind#RESULT} binds and hashes it. The recipe is written with
     * the row, since the lab server's everyday role cannot update a stored result.
     *
     * @param recipeSha256 the recipe that processed the spectrum, or null
     */
    static Map<String, Object> row(Result stored, String recipeSha256) {
        Provenance p = stored.getProvenance();
        ResultConditions c = stored.getConditions();
        Map<String, Object> row = new HashMap<>();
        row.put("id", stored.getId());
        row.put("project_id", stored.getProjectId());
        row.put("measurement_id", stored.getMeasurementId());
        row.put("compound", stored.getCompound());
        row.put("concentration", stored.getConcentration());
        row.put("uncertainty", stored.getStandardUncertainty());
        row.put("detection_limit", stored.getDetectionLimit());
        row.put("unit", stored.getUnit());
        row.put("flags", formatFlags(stored));
        row.put("method_version_id", p.methodVersionId());
        row.put("library_version_id", p.libraryVersionId());
        row.put("software_version", p.softwareVersion());
        row.put("input_hash", p.inputHash());
        row.put("recorded_by", stored.getRecordedBy());
        row.put("recorded_at", stored.getRecorded());
        row.put("recipe_sha256", recipeSha256);
        row.put("cell_temperature", c == null ? null : c.cellTemperatureK());
        row.put("cell_temperature_origin", c == null ? null : c.temperatureOrigin());
        row.put("cell_pressure", c == null ? null : c.cellPressureKPa());
        row.put("cell_pressure_origin", c == null ? null : c.pressureOrigin());
        row.put("path_length", c == null ? null : c.pathM());
        row.put("path_length_origin", c == null ? null : c.pathOrigin());
        row.put("reference_temperature", c == null ? null : c.referenceTemperatureK());
        row.put("reference_pressure", c == null ? null : c.referencePressureKPa());
        row.put("fit_path_length", c == null ? null : c.fitPathM());
        row.put("correction_factor", c == null ? null : c.correctionFactor());
        row.put("noise_factor", c == null ? null : c.noiseFactor());
        row.put("noise_factor_origin", c == null ? null : c.noiseFactorOrigin());
        return row;
    }

    /**
     * Checks that the result's method and library versions are of their kinds and freezes them, once per
     * transaction.
     *
     * @param checked versions already checked and frozen in this transaction
     * @param where   prefix of the field names in error messages, e.g. {@code "block[3].results[0]."}
     */
    static void requireVersions(Tx tx, JdbcVersionService versions, Result result, Set<String> checked,
            String where) throws SQLException {
        Provenance p = result.getProvenance();
        if (checked.add("method:" + p.methodVersionId())) {
            versions.requireUsableAndFreeze(tx, p.methodVersionId(), VersionKind.METHOD, where + "methodVersionId");
        }
        if (checked.add("library:" + p.libraryVersionId())) {
            versions.requireUsableAndFreeze(tx, p.libraryVersionId(), VersionKind.LIBRARY,
                    where + "libraryVersionId");
        }
    }

    @Override
    public List<Result> results(Session actor, String projectId) {
        return transactions.run("reading the results of project " + projectId, tx -> {
            Guard.requireProject(tx, actor, projectId, AccessLevel.READ);
            return tx.queryList("SELECT * FROM analysis_result WHERE project_id = ? ORDER BY recorded_at, id",
                    JdbcResultService::map, projectId);
        });
    }

    @Override
    public List<Result> ofMeasurement(Session actor, String measurementId) {
        return transactions.run("reading the results of measurement " + measurementId, tx -> {
            Guard.requireProjectOf(tx, actor, "measurement", "measurement", measurementId, AccessLevel.READ);
            return tx.queryList("SELECT * FROM analysis_result WHERE measurement_id = ? ORDER BY recorded_at, id",
                    JdbcResultService::map, measurementId);
        });
    }

    static String formatFlags(Result r) {
        return r.getFlags().isEmpty() ? ""
                : EnumSet.copyOf(r.getFlags()).stream().map(ResultFlag::getName).collect(Collectors.joining(","));
    }

    static Result map(ResultSet rs) throws SQLException {
        EnumSet<ResultFlag> flags = EnumSet.noneOf(ResultFlag.class);
        for (String name : rs.getString("flags").split(",")) {
            if (!name.isEmpty()) {
                flags.add(ResultFlag.valueOf(name));
            }
        }
        Result r = Results.of(rs.getString("measurement_id"), rs.getString("compound"), rs.getDouble("concentration"),
                rs.getDouble("uncertainty"), rs.getDouble("detection_limit"), rs.getString("unit"), flags,
                new Provenance(rs.getString("method_version_id"), rs.getString("library_version_id"),
                        rs.getString("software_version"), rs.getString("input_hash")),
                conditions(rs));
        r.setId(rs.getString("id"));
        r.setProjectId(rs.getString("project_id"));
        r.setRecordedBy(rs.getString("recorded_by"));
        r.setRecorded(Tx.instant(rs, "recorded_at"));
        return r;
    }

    /** The conditions of a stored result, null for a result not corrected. */
    private static ResultConditions conditions(ResultSet rs) throws SQLException {
        double factor = rs.getDouble("correction_factor");
        if (rs.wasNull()) {
            return null;
        }
        return new ResultConditions(rs.getDouble("cell_temperature"), rs.getString("cell_temperature_origin"),
                rs.getDouble("cell_pressure"), rs.getString("cell_pressure_origin"), rs.getDouble("path_length"),
                rs.getString("path_length_origin"), rs.getDouble("reference_temperature"),
                rs.getDouble("reference_pressure"), rs.getDouble("fit_path_length"), factor,
                rs.getDouble("noise_factor"), rs.getString("noise_factor_origin"));
    }

    /** The canonical values of a result's audit record. */
    static String values(Result r) {
        return AuditValues.canonical(fields(r));
    }

    /** The fields of a result's audit record, without its id. */
    static Map<String, Object> fields(Result r) {
        Provenance p = r.getProvenance();
        Map<String, Object> fields = new LinkedHashMap<>();
        fields.put("project", r.getProjectId());
        fields.put("measurement", r.getMeasurementId());
        fields.put("compound", r.getCompound());
        fields.put("concentration", r.getConcentration());
        fields.put("uncertainty", r.getStandardUncertainty());
        fields.put("detectionLimit", r.getDetectionLimit());
        fields.put("unit", r.getUnit());
        fields.put("flags", formatFlags(r));
        fields.put("methodVersion", p.methodVersionId());
        fields.put("libraryVersion", p.libraryVersionId());
        fields.put("softwareVersion", p.softwareVersion());
        fields.put("inputHash", p.inputHash());
        ResultConditions c = r.getConditions();
        if (c != null) {
            // only a corrected result has them, so the audit values of results without stay as they were
            fields.put("cellTemperature", c.cellTemperatureK());
            fields.put("cellTemperatureOrigin", c.temperatureOrigin());
            fields.put("cellPressure", c.cellPressureKPa());
            fields.put("cellPressureOrigin", c.pressureOrigin());
            fields.put("pathLength", c.pathM());
            fields.put("pathLengthOrigin", c.pathOrigin());
            fields.put("referenceTemperature", c.referenceTemperatureK());
            fields.put("referencePressure", c.referencePressureKPa());
            fields.put("fitPathLength", c.fitPathM());
            fields.put("correctionFactor", c.correctionFactor());
            fields.put("noiseFactor", c.noiseFactor());
            fields.put("noiseFactorOrigin", c.noiseFactorOrigin());
        }
        return fields;
    }
}
