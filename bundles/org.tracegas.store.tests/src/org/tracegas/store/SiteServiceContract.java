package org.tracegas.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.tracegas.model.Client;
import org.tracegas.model.EmissionSource;
import org.tracegas.model.Project;
import org.tracegas.model.Site;

/**
 * A client's sites and their emission sources, and the source a project measures, on each backend: an invented
 * cement works with two kiln stacks.
 */
abstract class SiteServiceContract extends AnalysisFixtureContract {


    private SiteService sites() {
        return f.store.sites();
    }

    private String clientId() {
        return f.project.getClient().getId();
    }

    @Test
    void aClientsSitesHoldTheirSourcesByNameAndEachCreationIsAudited() throws Exception {
        Site works = sites().createSite(f.analyst, clientId(), "Eastfield works", "cement plant, two kiln lines");
        assertEquals("Client", works.getClient().getName());
        EmissionSource kiln2 = sites().createSource(f.analyst, works.getId(), "Kiln 2 stack", "port at 38 m");
        EmissionSource kiln1 = sites().createSource(f.analyst, works.getId(), "Kiln 1 stack", "");
        assertEquals("Eastfield works", kiln1.getSite().getName());
        sites().createSite(f.analyst, clientId(), "Annex quarry", "");

        List<Site> read = sites().sites(f.reader, clientId());
        assertEquals(List.of("Annex quarry", "Eastfield works"), read.stream().map(Site::getName).toList());
        Site again = read.get(1);
        assertEquals(List.of(kiln1.getId(), kiln2.getId()), again.getSources().stream().map(EmissionSource::getId)
                .toList());
        assertEquals("port at 38 m", again.getSources().get(1).getDescription());
        assertSame(again.getClient(), read.get(0).getClient());
        assertEquals(2, f.count("SELECT COUNT(*) FROM audit_record WHERE action = 'CREATE' AND object_type = 'site'"));
        assertEquals(2, f.count("SELECT COUNT(*) FROM audit_record WHERE action = 'CREATE'"
                + " AND object_type = 'emission-source'"));
        WorkspaceVerification v = f.store.audit().verifyWorkspace(List.of());
        assertTrue(v.intact(), v.dataFindings().toString());
    }

    @Test
    void aProjectNamesTheSourceItMeasuresAndItsClientHoldsTheSites() throws Exception {
        // a project stored without a source (as every project of a workspace made before sites were kept)
        assertNull(f.store.projects().project(f.reader, f.project.getId()).getSource());
        Site works = sites().createSite(f.analyst, clientId(), "Eastfield works", "");
        EmissionSource kiln1 = sites().createSource(f.analyst, works.getId(), "Kiln 1 stack", "");
        EmissionSource kiln2 = sites().createSource(f.analyst, works.getId(), "Kiln 2 stack", "");

        Project set = sites().setSource(f.analyst, f.project.getId(), kiln1.getId());
        assertEquals("Kiln 1 stack", set.getSource().getName());
        Project read = f.store.projects().project(f.reader, f.project.getId());
        assertEquals(kiln1.getId(), read.getSource().getId());
        // the source is the one its site holds in the project's own client, not a loose copy
        assertSame(read.getClient(), read.getSource().getSite().getClient());
        assertEquals("Eastfield works", read.getSource().getSite().getName());
        Client listed = f.store.projects().clients(f.reader).get(0);
        assertEquals(List.of("Eastfield works"), listed.getSites().stream().map(Site::getName).toList());
        assertSame(listed.getSites().get(0).getSources().get(0), listed.getProjects().get(0).getSource());

        sites().setSource(f.analyst, f.project.getId(), kiln1.getId());
        assertEquals(1, f.count("SELECT COUNT(*) FROM audit_record WHERE object_type = 'project-source'"));
        sites().setSource(f.analyst, f.project.getId(), kiln2.getId());
        assertEquals("Kiln 2 stack", f.store.projects().project(f.reader, f.project.getId()).getSource().getName());
        assertEquals(1, f.count("SELECT COUNT(*) FROM audit_record WHERE object_type = 'project-source'"
                + " AND action = 'CHANGE' AND old_value LIKE '%" + kiln1.getId() + "%'"));
        WorkspaceVerification v = f.store.audit().verifyWorkspace(List.of());
        assertTrue(v.intact(), v.dataFindings().toString());
    }

    @Test
    void wrongInputIsRefusedNamingTheFieldAndNothingIsWritten() throws Exception {
        long records = f.count("SELECT COUNT(*) FROM audit_record");
        assertEquals("name must not be blank", assertThrows(IllegalArgumentException.class,
                () -> sites().createSite(f.analyst, clientId(), " ", "")).getMessage());
        assertTrue(assertThrows(IllegalArgumentException.class,
                () -> sites().createSite(f.analyst, clientId(), "Works", null)).getMessage().startsWith("description"));
        assertThrows(NoSuchObjectException.class, () -> sites().createSite(f.analyst, "no-such-client", "Works", ""));
        Site works = sites().createSite(f.analyst, clientId(), "Works", "");
        assertTrue(assertThrows(StoreException.class, () -> sites().createSite(f.analyst, clientId(), "Works", ""))
                .getMessage().contains("'Works' already"));
        EmissionSource stack = sites().createSource(f.analyst, works.getId(), "Stack", "");
        assertThrows(StoreException.class, () -> sites().createSource(f.analyst, works.getId(), "Stack", ""));
        assertThrows(NoSuchObjectException.class, () -> sites().createSource(f.analyst, "no-such-site", "Stack", ""));

        // a source at another client's site cannot be the project's
        Client other = f.store.projects().createClient(f.analyst, "Other client");
        Site far = sites().createSite(f.analyst, other.getId(), "Far works", "");
        EmissionSource farStack = sites().createSource(f.analyst, far.getId(), "Stack", "");
        assertTrue(assertThrows(StoreException.class,
                () -> sites().setSource(f.analyst, f.project.getId(), farStack.getId())).getMessage()
                .startsWith("sourceId: "));
        // the reader's grant is read only
        assertThrows(AccessDeniedException.class, () -> sites().setSource(f.reader, f.project.getId(),
                stack.getId()));
        assertEquals(0, f.count("SELECT COUNT(*) FROM project_source"));
        assertEquals(records + 5, f.count("SELECT COUNT(*) FROM audit_record"));
    }
}
