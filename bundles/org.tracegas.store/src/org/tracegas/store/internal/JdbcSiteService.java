package org.tracegas.store.internal;

import java.sql.SQLException;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.UUID;

import org.tracegas.audit.AuditAction;
import org.tracegas.audit.AuditEntry;
import org.tracegas.audit.AuditValues;
import org.tracegas.model.AccessLevel;
import org.tracegas.model.Client;
import org.tracegas.model.EmissionSource;
import org.tracegas.model.Project;
import org.tracegas.model.Site;
import org.tracegas.model.WorkspaceFactory;
import org.tracegas.store.NoSuchObjectException;
import org.tracegas.store.Session;
import org.tracegas.store.SiteService;
import org.tracegas.store.StoreException;

final class JdbcSiteService implements SiteService {

    private final Transactions transactions;

    JdbcSiteService(Transactions transactions) {
        this.transactions = transactions;
    }

    @Override
    public Site createSite(Session actor, String clientId, String name, String description) {
        JdbcUserService.requireText("name", name);
        requireDescription(description);
        return transactions.run("creating site " + name, tx -> {
            Guard.roles(tx, actor);
            Client client = client(tx, clientId);
            String id = insertNamed(tx, actor, DataKind.SITE, "client_id", clientId, "client '" + client.getName()
                    + "'", name, description);
            Site site = WorkspaceFactory.eINSTANCE.createSite();
            site.setId(id);
            site.setName(name);
            site.setDescription(description);
            client.getSites().add(site);
            return site;
        });
    }

    @Override
    public EmissionSource createSource(Session actor, String siteId, String name, String description) {
        JdbcUserService.requireText("name", name);
        requireDescription(description);
        return transactions.run("creating emission source " + name, tx -> {
            Guard.roles(tx, actor);
            String clientId = tx.queryOne("SELECT client_id FROM site WHERE id = ?", rs -> rs.getString(1), siteId)
                    .orElseThrow(() -> new NoSuchObjectException("site", siteId));
            // the site as the store reads it, in its client with its sources
            Site site = ModelRows.sites(tx, client(tx, clientId)).stream().filter(s -> s.getId().equals(siteId))
                    .findFirst().orElseThrow();
            String id = insertNamed(tx, actor, DataKind.EMISSION_SOURCE, "site_id", siteId, "site '"
                    + site.getName() + "'", name, description);
            EmissionSource source = WorkspaceFactory.eINSTANCE.createEmissionSource();
            source.setId(id);
            source.setName(name);
            source.setDescription(description);
            site.getSources().add(source);
            return source;
        });
    }

    @Override
    public List<Site> sites(Session actor, String clientId) {
        return transactions.run("reading the sites of client " + clientId, tx -> {
            Guard.roles(tx, actor);
            Client client = client(tx, clientId);
            return ModelRows.sites(tx, client);
        });
    }

    @Override
    public Project setSource(Session actor, String projectId, String sourceId) {
        JdbcUserService.requireText("sourceId", sourceId);
        return transactions.run("setting the emission source of project " + projectId, tx -> {
            Guard.requireProject(tx, actor, projectId, AccessLevel.WRITE);
            Project project = ModelRows.project(tx, projectId);
            String sourceClient = tx.queryOne("SELECT s.client_id FROM emission_source e JOIN site s"
                    + " ON s.id = e.site_id WHERE e.id = ?", rs -> rs.getString(1), sourceId)
                    .orElseThrow(() -> new NoSuchObjectException("emission source", sourceId));
            if (!sourceClient.equals(project.getClient().getId())) {
                throw new StoreException("sourceId: emission source " + sourceId + " is at a site of another"
                        + " client than project " + project.getCode() + "'s client '"
                        + project.getClient().getName() + "'");
            }
            Optional<String> before = tx.queryOne("SELECT source_id FROM project_source WHERE project_id = ?",
                    rs -> rs.getString(1), projectId);
            if (before.isPresent() && before.get().equals(sourceId)) {
                return project;
            }
            if (before.isPresent()) {
                tx.update("UPDATE project_source SET source_id = ? WHERE project_id = ?", sourceId, projectId);
            } else {
                tx.update("INSERT INTO project_source (project_id, source_id) VALUES (?, ?)", projectId, sourceId);
            }
            tx.wrote(DataKind.PROJECT_SOURCE, projectId);
            AuditEntry.Builder entry = AuditEntry.builder(actor.userId(),
                    before.isPresent() ? AuditAction.CHANGE : AuditAction.CREATE, "project-source", projectId);
            if (before.isPresent()) {
                entry.oldValue(AuditValues.canonical(Map.of("source", before.get())));
            }
            tx.audit(entry.newValue(AuditValues.canonical(Map.of("source", sourceId))).build());
            return ModelRows.project(tx, projectId);
        });
    }

    /**
     * Inserts a named row under its owner, with its audit record; a name the owner has already is refused.
     *
     * @param ownerColumn the row's column naming its owner, e.g. {@code client_id}
     * @param ownerWords  the owner as a message names it, e.g. "client 'Fellgate'"
     * @return the new row's id
     */
    private static String insertNamed(Tx tx, Session actor, DataKind kind, String ownerColumn, String owner,
            String ownerWords, String name, String description) throws SQLException {
        String what = kind.label().replace('-', ' ');
        if (tx.queryOne("SELECT 1 FROM " + kind.table() + " WHERE " + ownerColumn + " = ? AND name = ?", rs -> 1,
                owner, name).isPresent()) {
            throw new StoreException(ownerWords + " has a " + what + " named '" + name + "' already; choose another"
                    + " name");
        }
        String id = UUID.randomUUID().toString();
        tx.update("INSERT INTO " + kind.table() + " (id, " + ownerColumn + ", name, description, row_version)"
                + " VALUES (?, ?, ?, ?, 0)", id, owner, name, description);
        tx.wrote(kind, id);
        tx.audit(AuditEntry.builder(actor.userId(), AuditAction.CREATE, kind.label(), id).newValue(
                AuditValues.canonical(Map.of(ownerColumn.substring(0, ownerColumn.length() - "_id".length()), owner,
                        "name", name, "description", description))).build());
        return id;
    }

    private static Client client(Tx tx, String clientId) throws SQLException {
        return tx.queryOne("SELECT name, row_version FROM client WHERE id = ?",
                rs -> ModelRows.client(clientId, rs.getString(1), rs.getLong(2)), clientId)
                .orElseThrow(() -> new NoSuchObjectException("client", clientId));
    }

    private static void requireDescription(String description) {
        if (description == null) {
            throw new IllegalArgumentException("description must not be null (may be empty)");
        }
    }
}
