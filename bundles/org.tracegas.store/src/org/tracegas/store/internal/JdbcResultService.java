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
import org.tracegas.model.ResultFlag;
import org.tracegas.store.NewResult;
import org.tracegas.store.ResultConditions;
import org.tracegas.store.ResultInfo;
import org.tracegas.store.ResultService;
import org.tracegas.store.Session;
import org.tracegas.store.VersionKind;

final class JdbcResultService implements ResultService {

    private final Transactions transactions;
    private final JdbcVersionService versions;

    JdbcResultService(Transactions transactions, JdbcVersionService versions) {
        this.transactions = transactions;
        this.versions = versions;
    }

    @Override
    public ResultInfo record(Session actor, String projectId, NewResult result) {
        return recordAll(actor, projectId, Collections.singletonList(result)).get(0);
    }

    @Override
    public List<ResultInfo> recordAll(Session actor, String projectId, List<NewResult> results) {
        if (results == null || results.isEmpty()) {
            throw new IllegalArgumentException("results must hold at least one result");
        }
        for (int i = 0; i < results.size(); i++) {
            if (results.get(i) == null) {
                throw new IllegalArgumentException("results[" + i + "] is null");
            }
        }
        return transactions.run("recording " + results.size() + " result(s) in project " + projectId, tx -> {
            Guard.requireProject(tx, actor, projectId, AccessLevel.WRITE);
            Set<String> checked = new HashSet<>();
            List<ResultInfo> stored = new ArrayList<>(results.size());
            for (NewResult result : results) {
                stored.add(insert(tx, actor, projectId, result, checked));
            }
            return stored;
        });
    }

    /** The insert of a result; the recipe that processed its spectrum, if any, is written with the row. */
    static final String INSERT = DataKind.RESULT.insert("row_version", "0");

    /** @param checked versions and measurements already checked and frozen in this transaction */
    private ResultInfo insert(Tx tx, Session actor, String projectId, NewResult result, Set<String> checked)
            throws SQLException {
        requireVersions(tx, versions, result, checked, "");
        if (result.measurementId() != null && checked.add("measurement:" + result.measurementId())
                && tx.queryOne("SELECT 1 FROM measurement WHERE id = ? AND project_id = ?", rs -> 1,
                        result.measurementId(), projectId).isEmpty()) {
            throw new IllegalArgumentException("measurementId " + result.measurementId()
                    + " is not a measurement of project " + projectId);
        }
        ResultInfo stored = newInfo(actor, projectId, result, Instant.now().truncatedTo(ChronoUnit.MICROS));
        try (PreparedStatement ps = tx.connection().prepareStatement(INSERT)) {
            bindInsert(ps, stored);
            ps.executeUpdate();
        }
        tx.wrote(DataKind.RESULT, stored.id());
        tx.audit(AuditEntry.builder(actor.userId(), AuditAction.CREATE, "result", stored.id())
                .newValue(values(stored)).build());
        return stored;
    }

    static ResultInfo newInfo(Session actor, String projectId, NewResult result, Instant recorded) {
        return new ResultInfo(RowIds.next(), projectId, result, actor.userId(), recorded);
    }

    /** Binds a result without recipe to {@link #INSERT}. */
    static void bindInsert(PreparedStatement ps, ResultInfo stored) throws SQLException {
        DataKind.RESULT.bind(ps, row(stored, null));
    }

    /**
     * A result's row by column name, as {@link DataKind#RESULT} binds and hashes it. The recipe is written with
     * the row, since the lab server's everyday role cannot update a stored result.
     *
     * @param recipeSha256 the recipe that processed the spectrum, or null
     */
    static Map<String, Object> row(ResultInfo stored, String recipeSha256) {
        NewResult result = stored.values();
        ResultConditions c = result.conditions();
        Map<String, Object> row = new HashMap<>();
        row.put("id", stored.id());
        row.put("project_id", stored.projectId());
        row.put("measurement_id", result.measurementId());
        row.put("compound", result.compound());
        row.put("concentration", result.concentration());
        row.put("uncertainty", result.uncertainty());
        row.put("detection_limit", result.detectionLimit());
        row.put("unit", result.unit());
        row.put("flags", formatFlags(result));
        row.put("method_version_id", result.methodVersionId());
        row.put("library_version_id", result.libraryVersionId());
        row.put("software_version", result.softwareVersion());
        row.put("input_hash", result.inputHash());
        row.put("recorded_by", stored.recordedBy());
        row.put("recorded_at", stored.recorded());
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
    static void requireVersions(Tx tx, JdbcVersionService versions, NewResult result, Set<String> checked,
            String where) throws SQLException {
        if (checked.add("method:" + result.methodVersionId())) {
            versions.requireUsableAndFreeze(tx, result.methodVersionId(), VersionKind.METHOD,
                    where + "methodVersionId");
        }
        if (checked.add("library:" + result.libraryVersionId())) {
            versions.requireUsableAndFreeze(tx, result.libraryVersionId(), VersionKind.LIBRARY,
                    where + "libraryVersionId");
        }
    }

    @Override
    public List<ResultInfo> results(Session actor, String projectId) {
        return transactions.run("reading the results of project " + projectId, tx -> {
            Guard.requireProject(tx, actor, projectId, AccessLevel.READ);
            return tx.queryList("SELECT * FROM analysis_result WHERE project_id = ? ORDER BY recorded_at, id",
                    JdbcResultService::map, projectId);
        });
    }

    static String formatFlags(NewResult r) {
        return r.flags().isEmpty() ? ""
                : EnumSet.copyOf(r.flags()).stream().map(ResultFlag::getName).collect(Collectors.joining(","));
    }

    static ResultInfo map(ResultSet rs) throws SQLException {
        EnumSet<ResultFlag> flags = EnumSet.noneOf(ResultFlag.class);
        for (String name : rs.getString("flags").split(",")) {
            if (!name.isEmpty()) {
                flags.add(ResultFlag.valueOf(name));
            }
        }
        NewResult values = new NewResult(rs.getString("measurement_id"), rs.getString("compound"),
                rs.getDouble("concentration"), rs.getDouble("uncertainty"), rs.getDouble("detection_limit"),
                rs.getString("unit"), flags, rs.getString("method_version_id"), rs.getString("library_version_id"),
                rs.getString("software_version"), rs.getString("input_hash"), conditions(rs));
        return new ResultInfo(rs.getString("id"), rs.getString("project_id"), values, rs.getString("recorded_by"),
                Tx.instant(rs, "recorded_at"));
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
    static String values(ResultInfo r) {
        return AuditValues.canonical(fields(r));
    }

    /** The fields of a result's audit record, without its id. */
    static Map<String, Object> fields(ResultInfo r) {
        NewResult v = r.values();
        Map<String, Object> fields = new LinkedHashMap<>();
        fields.put("project", r.projectId());
        fields.put("measurement", v.measurementId());
        fields.put("compound", v.compound());
        fields.put("concentration", v.concentration());
        fields.put("uncertainty", v.uncertainty());
        fields.put("detectionLimit", v.detectionLimit());
        fields.put("unit", v.unit());
        fields.put("flags", formatFlags(v));
        fields.put("methodVersion", v.methodVersionId());
        fields.put("libraryVersion", v.libraryVersionId());
        fields.put("softwareVersion", v.softwareVersion());
        fields.put("inputHash", v.inputHash());
        ResultConditions c = v.conditions();
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
