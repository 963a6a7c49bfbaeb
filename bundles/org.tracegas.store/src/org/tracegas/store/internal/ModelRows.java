package org.tracegas.store.internal;

import java.sql.ResultSet;
import java.sql.SQLException;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import org.tracegas.model.Client;
import org.tracegas.model.EmissionSource;
import org.tracegas.model.Instrument;
import org.tracegas.model.Measurement;
import org.tracegas.model.MeasurementKind;
import org.tracegas.model.Project;
import org.tracegas.model.Site;
import org.tracegas.model.SpectralContent;
import org.tracegas.model.WorkspaceFactory;
import org.tracegas.store.NoSuchObjectException;

/**
 * Reads clients, projects and measurements as objects of the workspace model: a project in its client (which
 * holds its sites and their emission sources) with the source it measures, a measurement in its project, with
 * what its file gave it when it was imported from one and the instrument that made it.
 */
final class ModelRows {

    /** Projects with their client and the id of the source each measures, if any; a WHERE and ORDER BY follow. */
    static final String SELECT_PROJECT = "SELECT p.id, p.code, p.name, p.row_version, p.client_id,"
            + " c.name AS client_name, c.row_version AS client_row_version, ps.source_id FROM project p"
            + " JOIN client c ON c.id = p.client_id LEFT JOIN project_source ps ON ps.project_id = p.id";

    /** An instrument's columns, from the table as {@code ins}, as {@link #instrument} reads them. */
    static final String INSTRUMENT_COLUMNS = "ins.id AS instrument_id, ins.name AS instrument_name,"
            + " ins.serial_number, ins.laser_wavenumber, ins.max_path_difference, ins.field_of_view,"
            + " ins.cell_path_length, ins.row_version AS instrument_row_version";

    /**
     * A project's measurements with their file's record and their instrument, if any; parameter: the project
     * id.
     */
    private static final String SELECT_MEASUREMENT = "SELECT m.id, m.kind, m.measured_at, m.cell_temperature,"
            + " m.cell_pressure, m.operator_id, m.row_version, i.title, i.content, i.spectrum_id, i.labels,"
            + " i.raw_sha256, i.record_index, f.file_name, " + INSTRUMENT_COLUMNS + " FROM measurement m"
            + " LEFT JOIN imported_measurement i ON i.measurement_id = m.id"
            + " LEFT JOIN raw_file f ON f.project_id = i.project_id AND f.sha256 = i.raw_sha256"
            + " LEFT JOIN measurement_instrument mi ON mi.measurement_id = m.id"
            + " LEFT JOIN instrument ins ON ins.id = mi.instrument_id"
            + " WHERE m.project_id = ?";

    /** A client's sites with their sources, sites and sources by name; parameter: the client id. */
    private static final String SELECT_SITES = "SELECT s.id, s.name, s.description, s.row_version, e.id AS source_id,"
            + " e.name AS source_name, e.description AS source_description, e.row_version AS source_row_version"
            + " FROM site s LEFT JOIN emission_source e ON e.site_id = s.id WHERE s.client_id = ?"
            + " ORDER BY s.name, s.id, e.name, e.id";

    private static final WorkspaceFactory FACTORY = WorkspaceFactory.eINSTANCE;

    private ModelRows() {
    }

    /** The project, in its client, with its source. */
    static Project project(Tx tx, String projectId) throws SQLException {
        return firstProject(tx, " WHERE p.id = ?", projectId)
                .orElseThrow(() -> new NoSuchObjectException("project", projectId));
    }

    /** The first project of a query's rows, in its client, with its source. */
    static Optional<Project> firstProject(Tx tx, String where, Object... params) throws SQLException {
        Map<Project, String> sourceIds = new HashMap<>();
        Optional<Project> p = tx.queryOne(SELECT_PROJECT + where, projectsIn(new HashMap<>(), sourceIds), params);
        if (p.isPresent()) {
            withSources(tx, List.of(p.get()), sourceIds);
        }
        return p;
    }

    /** Projects of a query's rows, each with its source; those of one client share the client object. */
    static List<Project> projects(Tx tx, String where, Object... params) throws SQLException {
        Map<Project, String> sourceIds = new HashMap<>();
        return withSources(tx, tx.queryList(SELECT_PROJECT + where, projectsIn(new HashMap<>(), sourceIds), params),
                sourceIds);
    }

    /**
     * Reads each project's client's sites into the client (once per client) and sets the project's source.
     *
     * @param sourceIds the id of the source each project measures, as its row gave it; none for a project without
     */
    private static List<Project> withSources(Tx tx, List<Project> projects, Map<Project, String> sourceIds)
            throws SQLException {
        Map<Client, Map<String, EmissionSource>> sourcesOf = new HashMap<>();
        for (Project p : projects) {
            Map<String, EmissionSource> sources = sourcesOf.get(p.getClient());
            if (sources == null) {
                sources = sourcesById(sites(tx, p.getClient()));
                sourcesOf.put(p.getClient(), sources);
            }
            String sourceId = sourceIds.get(p);
            if (sourceId != null) {
                p.setSource(sources.get(sourceId));
            }
        }
        return projects;
    }

    private static Map<String, EmissionSource> sourcesById(List<Site> sites) {
        Map<String, EmissionSource> byId = new HashMap<>();
        for (Site s : sites) {
            for (EmissionSource e : s.getSources()) {
                byId.put(e.getId(), e);
            }
        }
        return byId;
    }

    /**
     * Reads the client's stored sites, each with its sources, into the client.
     *
     * @return the sites read, by name (then id)
     */
    static List<Site> sites(Tx tx, Client client) throws SQLException {
        Map<String, Site> sites = new LinkedHashMap<>();
        tx.queryList(SELECT_SITES, rs -> {
            Site site = sites.get(rs.getString("id"));
            if (site == null) {
                site = FACTORY.createSite();
                site.setId(rs.getString("id"));
                site.setName(rs.getString("name"));
                site.setDescription(rs.getString("description"));
                site.setRowVersion(rs.getLong("row_version"));
                sites.put(site.getId(), site);
            }
            if (rs.getString("source_id") != null) {
                EmissionSource e = FACTORY.createEmissionSource();
                e.setId(rs.getString("source_id"));
                e.setName(rs.getString("source_name"));
                e.setDescription(rs.getString("source_description"));
                e.setRowVersion(rs.getLong("source_row_version"));
                site.getSources().add(e);
            }
            return site;
        }, client.getId());
        client.getSites().addAll(sites.values());
        return new ArrayList<>(sites.values());
    }

    /**
     * An instrument from the current row holding {@link #INSTRUMENT_COLUMNS}, taken from those read before when
     * one of its id was.
     */
    static Instrument instrument(ResultSet rs, Map<String, Instrument> read) throws SQLException {
        String id = rs.getString("instrument_id");
        Instrument known = read.get(id);
        if (known != null) {
            return known;
        }
        Instrument i = FACTORY.createInstrument();
        i.setId(id);
        i.setName(rs.getString("instrument_name"));
        i.setSerialNumber(rs.getString("serial_number"));
        i.setLaserWavenumber(rs.getDouble("laser_wavenumber"));
        i.setMaxPathDifference(rs.getDouble("max_path_difference"));
        double fieldOfView = rs.getDouble("field_of_view");
        if (!rs.wasNull()) {
            i.setFieldOfView(fieldOfView);
        }
        i.setCellPathLength(rs.getDouble("cell_path_length"));
        i.setRowVersion(rs.getLong("instrument_row_version"));
        read.put(id, i);
        return i;
    }

    private static Tx.RowMapper<Project> projectsIn(Map<String, Client> clients, Map<Project, String> sourceIds) {
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
            String sourceId = rs.getString("source_id");
            if (sourceId != null) {
                sourceIds.put(p, sourceId);
            }
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
        Map<String, Instrument> instruments = new HashMap<>();
        List<Measurement> read = tx.queryList(SELECT_MEASUREMENT + filter + " " + order,
                rs -> measurement(rs, instruments), project.getId());
        List<Measurement> into = project.getMeasurements();
        for (Measurement m : read) {
            into.add(m);
        }
        return new ArrayList<>(read);
    }

    private static Measurement measurement(ResultSet rs, Map<String, Instrument> instruments) throws SQLException {
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
        if (rs.getString("instrument_id") != null) {
            m.setInstrument(instrument(rs, instruments));
        }
        return m;
    }
}
