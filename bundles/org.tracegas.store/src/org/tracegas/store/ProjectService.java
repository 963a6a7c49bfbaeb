package org.tracegas.store;

import java.time.Instant;
import java.util.List;
import java.util.Optional;

import org.tracegas.model.AccessLevel;
import org.tracegas.model.Client;
import org.tracegas.model.Measurement;
import org.tracegas.model.MeasurementKind;
import org.tracegas.model.Project;

/**
 * Clients, projects (campaigns), access grants and measurements. Project data is visible only to users
 * with a grant on the project; the creator of a project gets a write grant.
 * <p>
 * What it reads are objects of the workspace model, freshly made for each call and the caller's to keep or
 * change: a {@link Project} comes contained in its {@link Client}, a {@link Measurement} in its project.
 * Changing them changes nothing stored.
 */
public interface ProjectService {

    /** @return the new client */
    Client createClient(Session actor, String name);

    /** @return the new project, in its client */
    Project createProject(Session actor, String clientId, String code, String name);

    /**
     * Grants (or changes) a user's access to a project.
     *
     * @throws AccessDeniedException unless the actor has write access to the project or is an administrator
     */
    void grant(Session actor, String projectId, String userId, AccessLevel access);

    /** @throws AccessDeniedException without at least read access */
    Project project(Session actor, String projectId);

    /**
     * @param expectedVersion the project's row version the change was made on
     * @throws ConcurrentChangeException if the project was changed since
     * @throws AccessDeniedException     without write access
     */
    Project rename(Session actor, String projectId, long expectedVersion, String newName);

    /**
     * Records a measurement made by the actor.
     *
     * @param cellTemperature in K
     * @param cellPressure    in hPa
     * @return the measurement's id
     */
    String recordMeasurement(Session actor, String projectId, MeasurementKind kind, Instant time,
            double cellTemperature, double cellPressure);

    /**
     * The project with a code, empty when there is none. Codes are unique per client; when clients share a
     * code, the oldest-created id in sort order wins.
     *
     * @throws AccessDeniedException without read access to the project found
     */
    Optional<Project> findByCode(Session actor, String code);

    /**
     * The projects the actor has a read or write grant on, ordered by code (then id), each in its client;
     * projects of one client share the client object.
     */
    List<Project> projects(Session actor);

    /**
     * The clients owning at least one project the actor may read, ordered by name, each holding those
     * projects (as {@link #projects} orders them) and no others.
     */
    List<Client> clients(Session actor);

    /**
     * The measurements of a project in time order, each in the project (as {@link #project} reads it), with
     * its operator; one imported from a file also has its title, labels, content, stored spectrum and source
     * as {@link ImportService#measurements} reads them.
     *
     * @throws AccessDeniedException without read access to the project
     */
    List<Measurement> measurements(Session actor, String projectId);
}
