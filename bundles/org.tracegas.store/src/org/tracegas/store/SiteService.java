package org.tracegas.store;

import java.util.List;

import org.tracegas.model.Client;
import org.tracegas.model.EmissionSource;
import org.tracegas.model.Project;
import org.tracegas.model.Site;

/**
 * A client's sites (plants) and their emission sources (stacks, ducts, sampling ports), and the source a
 * project measures. Each creation and each change of a project's source writes its audit record.
 * <p>
 * What it reads are objects of the workspace model, freshly made for each call: a {@link Site} comes contained
 * in its {@link Client}, an {@link EmissionSource} in its site.
 */
public interface SiteService {

    /**
     * @param description what and where the site is; may be empty, not null
     * @return the new site, in its client
     * @throws NoSuchObjectException if the client does not exist
     * @throws StoreException        if the client has a site of that name already
     */
    Site createSite(Session actor, String clientId, String name, String description);

    /**
     * @param description what the source is; may be empty, not null
     * @return the new source, in its site
     * @throws NoSuchObjectException if the site does not exist
     * @throws StoreException        if the site has a source of that name already
     */
    EmissionSource createSource(Session actor, String siteId, String name, String description);

    /**
     * The client's sites ordered by name (then id), each holding its sources ordered by name (then id), in the
     * client.
     *
     * @throws NoSuchObjectException if the client does not exist
     */
    List<Site> sites(Session actor, String clientId);

    /**
     * Sets (or changes) the emission source a project measures; the source must be at a site of the project's
     * own client.
     *
     * @return the project as {@link ProjectService#project} reads it afterwards, its source set
     * @throws AccessDeniedException without write access to the project
     * @throws NoSuchObjectException if the source does not exist
     */
    Project setSource(Session actor, String projectId, String sourceId);
}
