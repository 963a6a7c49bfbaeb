package org.tracegas.ui.items;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.tracegas.model.Client;
import org.tracegas.model.EmissionSource;
import org.tracegas.model.Measurement;
import org.tracegas.model.Project;
import org.tracegas.model.Site;
import org.tracegas.model.Workspace;
import org.tracegas.model.WorkspaceFactory;
import org.tracegas.model.provider.WorkbenchItemProviderAdapterFactory;

/** A tree's content taken from the workspace model's generated item providers. */
class ItemTreeContentTest {

    private final WorkbenchItemProviderAdapterFactory adapters = new WorkbenchItemProviderAdapterFactory();
    private final ItemTreeContent content = new ItemTreeContent(adapters);

    @AfterEach
    void dispose() {
        adapters.dispose();
    }

    @Test
    void aClientShowsItsSitesBesideItsProjectsAndASiteItsEmissionSources() {
        WorkspaceFactory f = WorkspaceFactory.eINSTANCE;
        Client client = f.createClient();
        Project project = f.createProject();
        Site plant = f.createSite();
        EmissionSource stack = f.createEmissionSource();
        client.getProjects().add(project);
        client.getSites().add(plant);
        plant.getSources().add(stack);
        project.setSource(stack);

        assertArrayEquals(new Object[] {project, plant}, content.getChildren(client));
        assertArrayEquals(new Object[] {stack}, content.getChildren(plant));
        assertFalse(content.hasChildren(stack));
        assertEquals(plant, content.getParent(stack));
        assertEquals(client, content.getParent(plant));
    }

    @Test
    void theTreeFollowsTheModelsContainment() {
        WorkspaceFactory f = WorkspaceFactory.eINSTANCE;
        Workspace w = f.createWorkspace();
        Client client = f.createClient();
        Project project = f.createProject();
        Measurement m = f.createMeasurement();
        w.getClients().add(client);
        client.getProjects().add(project);
        project.getMeasurements().add(m);
        w.getLibraries().add(f.createReferenceLibrary());

        assertArrayEquals(new Object[] {client, w.getLibraries().get(0)}, content.getElements(w));
        assertArrayEquals(new Object[] {project}, content.getChildren(client));
        assertTrue(content.hasChildren(project));
        assertFalse(content.hasChildren(m));
        assertEquals(project, content.getParent(m));
        assertEquals(client, content.getParent(project));
    }

    @Test
    void anElementWithoutItemProviderIsALeafWithoutParent() {
        assertArrayEquals(new Object[0], content.getChildren("a heading"));
        assertFalse(content.hasChildren("a heading"));
        assertNull(content.getParent("a heading"));
        assertNull(content.getParent(null));
    }

    @Test
    void anAdapterFactoryIsRequired() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> new ItemTreeContent(null));
        assertEquals("adapters must not be null", e.getMessage());
    }
}
