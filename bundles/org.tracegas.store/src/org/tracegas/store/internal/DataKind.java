package org.tracegas.store.internal;

import static org.tracegas.audit.CanonicalRow.Type.BOOLEAN;
import static org.tracegas.audit.CanonicalRow.Type.BYTES;
import static org.tracegas.audit.CanonicalRow.Type.INTEGER;
import static org.tracegas.audit.CanonicalRow.Type.REAL;
import static org.tracegas.audit.CanonicalRow.Type.TEXT;
import static org.tracegas.audit.CanonicalRow.Type.TIME;

import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;

import org.tracegas.audit.CanonicalRow;
import org.tracegas.audit.CanonicalRow.Column;

/**
 * The tables whose rows the audit trail vouches for, and which of their columns are bound: every column
 * that carries a stored value, in the order given here (the {@link CanonicalRow} field order). Left out are
 * only bookkeeping columns that change without a change of the data: {@code row_version} (optimistic
 * locking), {@code spectral_data.seq} (storage position), {@code content_version.frozen} (set when a result
 * first uses a version, which from then on cannot change) and {@code app_user.failed_logins} (counted on
 * every log-in attempt; the lock it leads to is bound). Work batches and units are the runners' schedule,
 * not data, and are not bound.
 */
enum DataKind {
    USER("user", "app_user", "id", col("id", TEXT), col("login", TEXT), col("display_name", TEXT),
            col("roles", TEXT), col("password_salt", BYTES), col("password_hash", BYTES),
            col("password_iterations", INTEGER), col("locked", BOOLEAN)),
    CLIENT("client", "client", "id", col("id", TEXT), col("name", TEXT)),
    PROJECT("project", "project", "id", col("id", TEXT), col("client_id", TEXT), col("code", TEXT),
            col("name", TEXT)),
    /** Key {@code <project id>/<user id>}, as the grant's audit records name it. */
    GRANT("project-grant", "project_grant", "project_id,user_id", col("project_id", TEXT),
            col("user_id", TEXT), col("access", TEXT)),
    MEASUREMENT("measurement", "measurement", "id", col("id", TEXT), col("project_id", TEXT), col("kind", TEXT),
            col("measured_at", TIME), col("cell_temperature", REAL), col("cell_pressure", REAL),
            col("operator_id", TEXT)),
    SPECTRAL_DATA("spectral-data", "spectral_data", "id", col("id", TEXT), col("project_id", TEXT),
            col("measurement_id", TEXT), col("content", TEXT), col("ordinate", TEXT), col("axis_unit", TEXT),
            col("point_count", INTEGER), col("axis_first", REAL), col("axis_step", REAL), col("axis_values", BYTES),
            col("value_encoding", TEXT), col("value_data", BYTES), col("sha256", TEXT)),
    VERSIONED_ITEM("versioned-item", "versioned_item", "id", col("id", TEXT), col("kind", TEXT), col("name", TEXT)),
    /** Method and library versions. */
    CONTENT_VERSION("content-version", "content_version", "id", col("id", TEXT), col("item_id", TEXT),
            col("number", INTEGER), col("parent_id", TEXT), col("author_id", TEXT), col("reason", TEXT),
            col("created_at", TIME), col("content", TEXT), col("content_hash", TEXT)),
    RESULT("result", "analysis_result", "id", col("id", TEXT), col("project_id", TEXT), col("measurement_id", TEXT),
            col("compound", TEXT), col("concentration", REAL), col("uncertainty", REAL),
            col("detection_limit", REAL), col("unit", TEXT), col("flags", TEXT), col("method_version_id", TEXT),
            col("library_version_id", TEXT), col("software_version", TEXT), col("input_hash", TEXT),
            col("recorded_by", TEXT), col("recorded_at", TIME), col("recipe_sha256", TEXT),
            col("cell_temperature", REAL), col("cell_temperature_origin", TEXT), col("cell_pressure", REAL),
            col("cell_pressure_origin", TEXT), col("path_length", REAL), col("path_length_origin", TEXT),
            col("reference_temperature", REAL), col("reference_pressure", REAL), col("fit_path_length", REAL),
            col("correction_factor", REAL), col("noise_factor", REAL), col("noise_factor_origin", TEXT)),
    QA_CHECK("qa-check", "qa_check", "id", col("id", TEXT), col("project_id", TEXT),
            col("method_version_id", TEXT), col("seq", INTEGER), col("check_name", TEXT), col("passed", BOOLEAN),
            col("measured", REAL), col("unit", TEXT), col("lower_limit", REAL), col("upper_limit", REAL),
            col("rule", TEXT), col("source", TEXT), col("recorded_by", TEXT), col("recorded_at", TIME)),
    /** A lab's file kept whole; key {@code <project id>/<sha256>}, as its audit record names it. */
    RAW_FILE("raw-file", "raw_file", "project_id,sha256", col("project_id", TEXT), col("sha256", TEXT),
            col("file_name", TEXT), col("format", TEXT), col("byte_count", INTEGER), col("content", BYTES),
            col("imported_by", TEXT), col("imported_at", TIME)),
    /** What a measurement imported from a lab's file came from: file, record, title and labels. */
    IMPORTED_MEASUREMENT("imported-measurement", "imported_measurement", "measurement_id",
            col("measurement_id", TEXT), col("project_id", TEXT), col("raw_sha256", TEXT),
            col("record_index", INTEGER), col("title", TEXT), col("content", TEXT), col("spectrum_id", TEXT),
            col("labels", TEXT)),
    /** A processing recipe that ran, kept once under the SHA-256 of its text. */
    PROCESSING_RECIPE("processing-recipe", "processing_recipe", "sha256", col("sha256", TEXT), col("text", TEXT)),
    SITE("site", "site", "id", col("id", TEXT), col("client_id", TEXT), col("name", TEXT), col("description", TEXT)),
    EMISSION_SOURCE("emission-source", "emission_source", "id", col("id", TEXT), col("site_id", TEXT),
            col("name", TEXT), col("description", TEXT)),
    INSTRUMENT("instrument", "instrument", "id", col("id", TEXT), col("name", TEXT), col("serial_number", TEXT),
            col("laser_wavenumber", REAL), col("max_path_difference", REAL), col("field_of_view", REAL),
            col("cell_path_length", REAL)),
    /** The emission source a project measures; key: the project id. */
    PROJECT_SOURCE("project-source", "project_source", "project_id", col("project_id", TEXT),
            col("source_id", TEXT)),
    /** The instrument that made a measurement; key: the measurement id. */
    MEASUREMENT_INSTRUMENT("measurement-instrument", "measurement_instrument", "measurement_id",
            col("measurement_id", TEXT), col("instrument_id", TEXT)),
    /** An issue of a report: its id, title, issuer and time, file, content hash and versions. */
    REPORT("report-issue", "report", "id", col("id", TEXT), col("project_id", TEXT), col("report_id", TEXT),
            col("title", TEXT), col("issued_at", TIME), col("issued_by", TEXT), col("content_sha256", TEXT),
            col("file_name", TEXT), col("page_count", INTEGER), col("method_version_id", TEXT),
            col("library_version_id", TEXT));

    private final String label;
    private final String table;
    /** The key columns, comma-separated. */
    private final String key;
    private final List<Column> columns;

    DataKind(String label, String table, String key, Column... columns) {
        this.label = label;
        this.table = table;
        this.key = key;
        this.columns = List.of(columns);
    }

    private static Column col(String name, CanonicalRow.Type type) {
        return new Column(name, type);
    }

    /** The name findings and bindings use, e.g. "result". */
    String label() {
        return label;
    }

    /** The kind with this {@link #label()}, or null. */
    static DataKind ofLabel(String label) {
        for (DataKind k : values()) {
            if (k.label.equals(label)) {
                return k;
            }
        }
        return null;
    }

    String table() {
        return table;
    }

    /** The key columns; a key of several columns is written with '/' between their values. */
    String[] keyColumns() {
        return key.split(",");
    }

    /** SQL expression of a row's key (a text value): its key columns joined by '/'. */
    String keyExpression(String alias) {
        return java.util.Arrays.stream(keyColumns()).map(k -> alias + "." + k)
                .collect(Collectors.joining(" || '/' || "));
    }

    boolean hasProject() {
        return columns.stream().anyMatch(c -> c.name().equals("project_id"));
    }

    /** The bound columns, selected with the key as {@code row_key}. */
    String selectList(String alias) {
        List<String> names = new ArrayList<>();
        names.add(keyExpression(alias) + " AS row_key");
        names.addAll(columns.stream().map(c -> alias + "." + c.name()).collect(Collectors.toList()));
        return String.join(", ", names);
    }

    /** SHA-256 of the current row of a result set holding the bound columns. */
    String sha256(ResultSet rs) throws SQLException {
        return CanonicalRow.sha256(label, columns, rs);
    }

    /**
     * SHA-256 of a row from the values it is inserted with ({@link #bind}): the hash {@link #sha256(ResultSet)}
     * gives for it once stored, so a block's rows are bound without reading them back.
     *
     * @param row the value of every bound column, by column name
     * @throws IllegalStateException naming a bound column the row lacks
     */
    String sha256(Map<String, ?> row) {
        return CanonicalRow.sha256(label, columns, inColumnOrder(row));
    }

    /**
     * INSERT of a row with every bound column, in their order, plus columns with a fixed value.
     *
     * @param fixed column names and SQL values, e.g. {@code "row_version", "0"}
     */
    String insert(String... fixed) {
        List<String> names = new ArrayList<>();
        List<String> values = new ArrayList<>();
        for (Column c : columns) {
            names.add(c.name());
            values.add("?");
        }
        for (int i = 0; i < fixed.length; i += 2) {
            names.add(fixed[i]);
            values.add(fixed[i + 1]);
        }
        return "INSERT INTO " + table + " (" + String.join(", ", names) + ") VALUES (" + String.join(", ", values)
                + ")";
    }

    /** Binds a row's values, by column name, to the parameters of {@link #insert}. */
    void bind(PreparedStatement ps, Map<String, ?> row) throws SQLException {
        Tx.bind(ps, inColumnOrder(row).toArray());
    }

    private List<Object> inColumnOrder(Map<String, ?> row) {
        List<Object> values = new ArrayList<>(columns.size());
        for (Column c : columns) {
            if (!row.containsKey(c.name())) {
                throw new IllegalStateException(label + " row: no value for column " + c.name());
            }
            values.add(row.get(c.name()));
        }
        return values;
    }
}
