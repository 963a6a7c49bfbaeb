package org.tracegas.store.internal;

import java.sql.SQLException;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.UUID;

import org.tracegas.audit.AuditAction;
import org.tracegas.audit.AuditEntry;
import org.tracegas.audit.AuditValues;
import org.tracegas.model.AccessLevel;
import org.tracegas.model.Client;
import org.tracegas.model.Measurement;
import org.tracegas.model.MeasurementKind;
import org.tracegas.model.Project;
import org.tracegas.model.Role;
import org.tracegas.model.WorkspaceFactory;
import org.tracegas.store.NoSuchObjectException;
import org.tracegas.store.ProjectService;
import org.tracegas.store.Session;
import org.tracegas.store.StoreException;

final class JdbcProjectService implements ProjectService {

    private final Transactions transactions;

    JdbcProjectService(Transactions transactions) {
        this.transactions = transactions;
    }

    @Override
    public Client createClient(Session actor, String name) {
        JdbcUserService.requireText("name", name);
        return transactions.run("creating client " + name, tx -> {
            Guard.roles(tx, actor);
            if (tx.queryOne("SELECT 1 FROM client WHERE name = ?", rs -> 1, name).isPresent()) {
                throw new StoreException("a client named '" + name + "' exists already in this workspace");
            }
            String id = UUID.randomUUID().toString();
            tx.update("INSERT INTO client (id, name, row_version) VALUES (?, ?, 0)", id, name);
            tx.wrote(DataKind.CLIENT, id);
            tx.audit(AuditEntry.builder(actor.userId(), AuditAction.CREATE, "client", id)
                    .newValue(AuditValues.canonical(Map.of("name", name))).build());
            return ModelRows.client(id, name, 0);
        });
    }

    @Override
    public Project createProject(Session actor, String clientId, String code, String name) {
        JdbcUserService.requireText("code", code);
        JdbcUserService.requireText("name", name);
        return transactions.run("creating project " + code, tx -> {
            Guard.roles(tx, actor);
            Client client = tx.queryOne("SELECT name, row_version FROM client WHERE id = ?",
                    rs -> ModelRows.client(clientId, rs.getString(1), rs.getLong(2)), clientId)
                    .orElseThrow(() -> new NoSuchObjectException("client", clientId));
            if (tx.queryOne("SELECT 1 FROM project WHERE client_id = ? AND code = ?", rs -> 1, clientId, code)
                    .isPresent()) {
                throw new StoreException("the client has a project with the code '" + code
                        + "' already; choose another code");
            }
            Project project = WorkspaceFactory.eINSTANCE.createProject();
            project.setId(UUID.randomUUID().toString());
            project.setCode(code);
            project.setName(name);
            client.getProjects().add(project);
            tx.update("INSERT INTO project (id, client_id, code, name, row_version) VALUES (?, ?, ?, ?, 0)",
                    project.getId(), clientId, code, name);
            tx.wrote(DataKind.PROJECT, project.getId());
            tx.audit(AuditEntry.builder(actor.userId(), AuditAction.CREATE, "project", project.getId())
                    .newValue(values(project)).build());
            insertGrant(tx, actor, project.getId(), actor.userId(), AccessLevel.WRITE);
            return project;
        });
    }

    @Override
    public void grant(Session actor, String projectId, String userId, AccessLevel access) {
        if (access == null) {
            throw new IllegalArgumentException("access must not be null");
        }
        transactions.run("granting " + access + " on project " + projectId, tx -> {
            if (!Guard.roles(tx, actor).contains(Role.ADMINISTRATOR)) {
                Guard.requireProject(tx, actor, projectId, AccessLevel.WRITE);
            }
            if (tx.queryOne("SELECT 1 FROM app_user WHERE id = ?", rs -> 1, userId).isEmpty()) {
                throw new NoSuchObjectException("user", userId);
            }
            String before = tx.queryOne("SELECT access FROM project_grant WHERE project_id = ? AND user_id = ?",
                    rs -> rs.getString(1), projectId, userId).orElse(null);
            if (before == null) {
                insertGrant(tx, actor, projectId, userId, access);
            } else {
                tx.update("UPDATE project_grant SET access = ? WHERE project_id = ? AND user_id = ?", access,
                        projectId, userId);
                tx.wrote(DataKind.GRANT, projectId + "/" + userId);
                tx.audit(AuditEntry.builder(actor.userId(), AuditAction.CHANGE, "project-grant",
                        projectId + "/" + userId).oldValue(AuditValues.canonical(Map.of("access", before)))
                        .newValue(AuditValues.canonical(Map.of("access", access.getName()))).build());
            }
            return null;
        });
    }

    private static void insertGrant(Tx tx, Session actor, String projectId, String userId, AccessLevel access)
            throws SQLException {
        tx.update("INSERT INTO project_grant (project_id, user_id, access) VALUES (?, ?, ?)", projectId, userId,
                access);
        tx.wrote(DataKind.GRANT, projectId + "/" + userId);
        tx.audit(AuditEntry.builder(actor.userId(), AuditAction.CREATE, "project-grant", projectId + "/" + userId)
                .newValue(AuditValues.canonical(Map.of("access", access.getName()))).build());
    }

    @Override
    public Project project(Session actor, String projectId) {
        return transactions.run("reading project " + projectId, tx -> {
            Guard.requireProject(tx, actor, projectId, AccessLevel.READ);
            return ModelRows.project(tx, projectId);
        });
    }

    @Override
    public Project rename(Session actor, String projectId, long expectedVersion, String newName) {
        JdbcUserService.requireText("newName", newName);
        return transactions.run("renaming project " + projectId, tx -> {
            Guard.requireProject(tx, actor, projectId, AccessLevel.WRITE);
            Project project = ModelRows.project(tx, projectId);
            String before = values(project);
            long version = RowVersions.update(tx, "project", "project", projectId, expectedVersion, "name = ?",
                    newName);
            tx.wrote(DataKind.PROJECT, projectId);
            project.setName(newName);
            project.setRowVersion(version);
            tx.audit(AuditEntry.builder(actor.userId(), AuditAction.CHANGE, "project", projectId).version(version)
                    .oldValue(before).newValue(values(project)).build());
            return project;
        });
    }

    @Override
    public String recordMeasurement(Session actor, String projectId, MeasurementKind kind, Instant time,
            double cellTemperature, double cellPressure) {
        if (kind == null || time == null) {
            throw new IllegalArgumentException("kind and time of a measurement must not be null");
        }
        if (!(cellTemperature > 0) || !(cellPressure > 0)) {
            throw new IllegalArgumentException("cell temperature (K) and pressure (hPa) must be positive, were "
                    + cellTemperature + " and " + cellPressure);
        }
        return transactions.run("recording a measurement in project " + projectId, tx -> {
            Guard.requireProject(tx, actor, projectId, AccessLevel.WRITE);
            String id = UUID.randomUUID().toString();
            tx.update(INSERT_MEASUREMENT, id, projectId, kind, time, cellTemperature, cellPressure, actor.userId());
            tx.wrote(DataKind.MEASUREMENT, id);
            tx.audit(AuditEntry.builder(actor.userId(), AuditAction.CREATE, "measurement", id)
                    .newValue(AuditValues.canonical(measurementValues(projectId, kind, time, cellTemperature,
                            cellPressure))).build());
            return id;
        });
    }

    /** Parameters id, project_id, kind, measured_at, cell_temperature, cell_pressure, operator_id. */
    static final String INSERT_MEASUREMENT = DataKind.MEASUREMENT.insert("row_version", "0");

    /** A measurement's row by column name, as {@link DataKind#MEASUREMENT} binds and hashes it. */
    static Map<String, Object> measurementRow(String id, String projectId, MeasurementKind kind, Instant time,
            double cellTemperature, double cellPressure, String operatorId) {
        Map<String, Object> row = new HashMap<>();
        row.put("id", id);
        row.put("project_id", projectId);
        row.put("kind", kind.name());
        row.put("measured_at", time);
        row.put("cell_temperature", cellTemperature);
        row.put("cell_pressure", cellPressure);
        row.put("operator_id", operatorId);
        return row;
    }

    /** The fields of a new measurement's audit record. */
    static Map<String, Object> measurementValues(String projectId, MeasurementKind kind, Instant time,
            double cellTemperature, double cellPressure) {
        Map<String, Object> fields = new LinkedHashMap<>();
        fields.put("project", projectId);
        fields.put("kind", kind.getName());
        fields.put("time", time);
        fields.put("cellTemperature", cellTemperature);
        fields.put("cellPressure", cellPressure);
        return fields;
    }

    private static String values(Project p) {
        return AuditValues.canonical(Map.of("client", p.getClient().getId(), "code", p.getCode(), "name",
                p.getName()));
    }

    @Override
    public Optional<Project> findByCode(Session actor, String code) {
        JdbcUserService.requireText("code", code);
        return transactions.run("finding project " + code, tx -> {
            Optional<Project> found = ModelRows.firstProject(tx, " WHERE p.code = ? ORDER BY p.id", code);
            if (found.isPresent()) {
                Guard.requireProject(tx, actor, found.get().getId(), AccessLevel.READ);
            }
            return found;
        });
    }

    @Override
    public List<Project> projects(Session actor) {
        return transactions.run("listing the projects of " + login(actor), tx -> {
            Guard.roles(tx, actor);
            return readable(tx, actor);
        });
    }

    private static List<Project> readable(Tx tx, Session actor) throws SQLException {
        return ModelRows.projects(tx, " JOIN project_grant g ON g.project_id = p.id WHERE g.user_id = ?"
                + " ORDER BY p.code, p.id", actor.userId());
    }

    @Override
    public List<Client> clients(Session actor) {
        return transactions.run("listing the clients of " + login(actor), tx -> {
            Guard.roles(tx, actor);
            // a client is visible through the projects the actor may read, as project data is
            Set<Client> owners = new LinkedHashSet<>();
            for (Project p : readable(tx, actor)) {
                owners.add(p.getClient());
            }
            List<Client> clients = new ArrayList<>(owners);
            clients.sort(Comparator.comparing(Client::getName).thenComparing(Client::getId));
            return clients;
        });
    }

    private static String login(Session actor) {
        return actor == null ? "nobody" : actor.login();
    }

    @Override
    public List<Measurement> measurements(Session actor, String projectId) {
        return transactions.run("reading the measurements of project " + projectId, tx -> {
            Guard.requireProject(tx, actor, projectId, AccessLevel.READ);
            return ModelRows.measurements(tx, ModelRows.project(tx, projectId), "",
                    "ORDER BY m.measured_at, m.id");
        });
    }
}
