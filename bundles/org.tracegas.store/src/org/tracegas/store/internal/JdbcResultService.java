package org.tracegas.store.internal;

import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.Collections;
import java.util.EnumSet;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.UUID;
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
import org.tracegas.store.VersionInfo;
import org.tracegas.store.VersionKind;

final class JdbcResultService implements ResultService {

    private final Transactions transactions;

    JdbcResultService(Transactions transactions) {
        this.transactions = transactions;
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

    /** Columns of table analysis_result, in the order {@link #bindInsert} binds them. */
    private static final String COLUMNS = "id, project_id, measurement_id, compound, concentration,"
            + " uncertainty, detection_limit, unit, flags, method_version_id, library_version_id,"
            + " software_version, input_hash, recorded_by, recorded_at, cell_temperature, cell_temperature_origin,"
            + " cell_pressure, cell_pressure_origin, path_length, path_length_origin, reference_temperature,"
            + " reference_pressure, fit_path_length, correction_factor, noise_factor, noise_factor_origin,"
            + " row_version";
    private static final String VALUES = "?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?,"
            + " ?, ?, ?, 0";

    /** The parameter of {@link #INSERT_WITH_RECIPE} that takes the recipe. */
    static final int RECIPE_PARAMETER = 28;

    static final String INSERT = "INSERT INTO analysis_result (" + COLUMNS + ") VALUES (" + VALUES + ")";

    /**
     * As {@link #INSERT}, with the recipe that processed the spectrum as parameter {@link #RECIPE_PARAMETER}: written with the row,
     * since the lab server's everyday role cannot update a stored result.
     */
    static final String INSERT_WITH_RECIPE = "INSERT INTO analysis_result (" + COLUMNS + ", recipe_sha256) VALUES ("
            + VALUES + ", ?)";

    /** @param checked versions and measurements already checked and frozen in this transaction */
    private static ResultInfo insert(Tx tx, Session actor, String projectId, NewResult result,
            Set<String> checked) throws SQLException {
        requireVersions(tx, result, checked, "");
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
        return new ResultInfo(UUID.randomUUID().toString(), projectId, result, actor.userId(), recorded);
    }

    static void bindInsert(PreparedStatement ps, ResultInfo stored) throws SQLException {
        NewResult result = stored.values();
        ResultConditions c = result.conditions();
        Tx.bind(ps, stored.id(), stored.projectId(), result.measurementId(), result.compound(),
                result.concentration(), result.uncertainty(), result.detectionLimit(), result.unit(),
                formatFlags(result), result.methodVersionId(), result.libraryVersionId(), result.softwareVersion(),
                result.inputHash(), stored.recordedBy(), stored.recorded(),
                c == null ? null : c.cellTemperatureK(), c == null ? null : c.temperatureOrigin(),
                c == null ? null : c.cellPressureKPa(), c == null ? null : c.pressureOrigin(),
                c == null ? null : c.pathM(), c == null ? null : c.pathOrigin(),
                c == null ? null : c.referenceTemperatureK(), c == null ? null : c.referencePressureKPa(),
                c == null ? null : c.fitPathM(), c == null ? null : c.correctionFactor(),
                c == null ? null : c.noiseFactor(), c == null ? null : c.noiseFactorOrigin());
    }

    /**
     * Checks that the result's method and library versions are of their kinds and freezes them, once per
     * transaction.
     *
     * @param checked versions already checked and frozen in this transaction
     * @param where   prefix of the field names in error messages, e.g. {@code "block[3].results[0]."}
     */
    static void requireVersions(Tx tx, NewResult result, Set<String> checked, String where) throws SQLException {
        if (checked.add("method:" + result.methodVersionId())) {
            requireKind(JdbcVersionService.load(tx, result.methodVersionId()), VersionKind.METHOD,
                    where + "methodVersionId");
            JdbcVersionService.freeze(tx, result.methodVersionId());
        }
        if (checked.add("library:" + result.libraryVersionId())) {
            requireKind(JdbcVersionService.load(tx, result.libraryVersionId()), VersionKind.LIBRARY,
                    where + "libraryVersionId");
            JdbcVersionService.freeze(tx, result.libraryVersionId());
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

    private static void requireKind(VersionInfo version, VersionKind expected, String field) {
        if (version.kind() != expected) {
            throw new IllegalArgumentException(field + " " + version.id() + " is a " + version.kind()
                    + " version, not a " + expected + " version");
        }
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
