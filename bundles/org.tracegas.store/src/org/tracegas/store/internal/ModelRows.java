package org.tracegas.store.internal;

import java.sql.ResultSet;
import java.sql.SQLException;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import org.tracegas.model.Client;
import org.tracegas.model.Measurement;
import org.tracegas.model.MeasurementKind;
import org.tracegas.model.Project;
import org.tracegas.model.SpectralContent;
import org.tracegas.model.WorkspaceFactory;
import org.tracegas.store.NoSuchObjectException;

/**
 * Reads clients, projects and measurements as objects of the workspace model: a project in its client, a
 * measurement in its project, with what its file gave it when it was imported from one.
 */
final class ModelRows {

    /** Projects with their client; a WHERE and ORDER BY follow. */
    static final String SELECT_PROJECT = "SELECT p.id, p.code, p.name, p.row_version, p.client_id,"
            + " c.name AS client_name, c.row_version AS client_row_version FROM project p"
            + " JOIN client c ON c.id = p.client_id";

    /** A project's measurements with their file's record, if any; parameter: the project id. */
    private static final String SELECT_MEASUREMENT = "SELECT m.id, m.kind, m.measured_at, m.cell_temperature,"
            + " m.cell_pressure, m.operator_id, m.row_version, i.title, i.content, i.spectrum_id, i.labels,"
            + " i.raw_sha256, i.record_index, f.file_name FROM measurement m"
            + " LEFT JOIN imported_measurement i ON i.measurement_id = m.id"
            + " LEFT JOIN raw_file f ON f.project_id = i.project_id AND f.sha256 = i.raw_sha256"
            + " WHERE m.project_id = ?";

    private static final WorkspaceFactory FACTORY = WorkspaceFactory.eINSTANCE;

    private ModelRows() {
    }

    /** The project, in its client. */
    static Project project(Tx tx, String projectId) throws SQLException {
        return tx.queryOne(SELECT_PROJECT + " WHERE p.id = ?", projectsIn(new HashMap<>()), projectId)
                .orElseThrow(() -> new NoSuchObjectException("project", projectId));
    }

    /** The first project of a query's rows, in its client. */
    static Optional<Project> firstProject(Tx tx, String where, Object... params) throws SQLException {
        return tx.queryOne(SELECT_PROJECT + where, projectsIn(new HashMap<>()), params);
    }

    /** Projects of a query's rows; those of one client share the client object. */
    static List<Project> projects(Tx tx, String where, Object... params) throws SQLException {
        return tx.queryList(SELECT_PROJECT + where, projectsIn(new HashMap<>()), params);
    }

    private static Tx.RowMapper<Project> projectsIn(Map<String, Client> clients) {
        return rs -> {
            String clientId = rs.getString("client_id");
            Client client = clients.get(clientId);
            if (client == null) {
                client = client(clientId, rs.getString("client_name"), rs.getLong("client_row_version"));
                clients.put(clientId, client);
            }
            Project p = FACTORY.createProject();
            p.setId(rs.getString("id"));
            p.setCode(rs.getString("code"));
            p.setName(rs.getString("name"));
            p.setRowVersion(rs.getLong("row_version"));
            client.getProjects().add(p);
            return p;
        };
    }

    static Client client(String id, String name, long rowVersion) {
        Client c = FACTORY.createClient();
        c.setId(id);
        c.setName(name);
        c.setRowVersion(rowVersion);
        return c;
    }

    /**
     * Reads the project's stored measurements into it.
     *
     * @param filter an SQL condition on {@code m}, {@code i} and {@code f} after the project's, or ""
     * @param order  the ORDER BY clause
     * @return the measurements read, in that order
     */
    static List<Measurement> measurements(Tx tx, Project project, String filter, String order) throws SQLException {
        List<Measurement> read = tx.queryList(SELECT_MEASUREMENT + filter + " " + order, ModelRows::measurement,
                project.getId());
        List<Measurement> into = project.getMeasurements();
        for (Measurement m : read) {
            into.add(m);
        }
        return new ArrayList<>(read);
    }

    private static Measurement measurement(ResultSet rs) throws SQLException {
        Measurement m = FACTORY.createMeasurement();
        m.setId(rs.getString("id"));
        m.setRowVersion(rs.getLong("row_version"));
        m.setKind(MeasurementKind.valueOf(rs.getString("kind")));
        m.setTime(Tx.instant(rs, "measured_at"));
        m.setCellTemperature(rs.getDouble("cell_temperature"));
        m.setCellPressure(rs.getDouble("cell_pressure"));
        m.setOperatorId(rs.getString("operator_id"));
        String source = rs.getString("raw_sha256");
        if (source != null) {
            m.setTitle(rs.getString("title"));
            m.setContent(SpectralContent.valueOf(rs.getString("content")));
            m.setSpectrumId(rs.getString("spectrum_id"));
            m.getLabels().putAll(JdbcImportService.labels(rs.getString("labels")));
            m.setSourceFile(rs.getString("file_name"));
            m.setSourceSha256(source.trim());
            m.setSourceRecord(rs.getInt("record_index"));
        }
        return m;
    }
}
