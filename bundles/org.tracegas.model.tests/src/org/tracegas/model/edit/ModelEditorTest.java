package org.tracegas.model.edit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.tracegas.model.AnalysisMethod;
import org.tracegas.model.AnalysisRegion;
import org.tracegas.model.Client;
import org.tracegas.model.MeasurementKind;
import org.tracegas.model.Measurement;
import org.tracegas.model.MethodVersion;
import org.tracegas.model.Project;
import org.tracegas.model.Workspace;
import org.tracegas.model.WorkspaceFactory;
import org.tracegas.model.WorkspacePackage.Literals;

class ModelEditorTest {

    private final WorkspaceFactory factory = WorkspaceFactory.eINSTANCE;
    private ModelEditor editor;
    private Workspace workspace;

    @BeforeEach
    void setUp() {
        editor = new ModelEditor();
        workspace = factory.createWorkspace();
        editor.createResource("memory:/workspace.xmi").getContents().add(workspace);
    }

    @Test
    void setIsUndoneAndRedone() {
        Client client = factory.createClient();
        client.setName("Cement works");
        editor.add(workspace, Literals.WORKSPACE__CLIENTS, client);

        editor.set(client, Literals.CLIENT__NAME, "Cement works Nord");
        assertEquals("Cement works Nord", client.getName());

        editor.undo();
        assertEquals("Cement works", client.getName());
        editor.redo();
        assertEquals("Cement works Nord", client.getName());
    }

    @Test
    void addAndRemoveOfContainedObjectsAreUndone() {
        Client client = factory.createClient();
        Project project = factory.createProject();
        project.setCode("C-01");
        editor.add(workspace, Literals.WORKSPACE__CLIENTS, client);
        editor.add(client, Literals.CLIENT__PROJECTS, project);
        assertEquals(List.of(project), client.getProjects());
        assertEquals(client, project.eContainer());

        editor.remove(client, Literals.CLIENT__PROJECTS, project);
        assertTrue(client.getProjects().isEmpty());
        editor.undo();
        assertEquals(List.of(project), client.getProjects());

        editor.undo();
        editor.undo();
        assertTrue(workspace.getClients().isEmpty());
        assertFalse(editor.canUndo());
        assertThrows(IllegalStateException.class, editor::undo);

        editor.redo();
        editor.redo();
        assertEquals(List.of(project), client.getProjects());
    }

    @Test
    void manyValuedEnumAndReferenceChangesAreUndone() {
        AnalysisMethod method = factory.createAnalysisMethod();
        MethodVersion first = factory.createMethodVersion();
        MethodVersion second = factory.createMethodVersion();
        method.getVersions().addAll(List.of(first, second));
        editor.add(workspace, Literals.WORKSPACE__METHODS, method);
        AnalysisRegion region = factory.createAnalysisRegion();
        editor.add(second, Literals.METHOD_VERSION__REGIONS, region);
        editor.addAll(region, Literals.ANALYSIS_REGION__INTERFERENTS, List.of("H2O", "CO2"));
        assertEquals(List.of("H2O", "CO2"), region.getInterferents());

        Measurement measurement = factory.createMeasurement();
        editor.set(measurement, Literals.MEASUREMENT__KIND, MeasurementKind.SPIKE);
        first.setId("first-version");
        editor.set(second, Literals.CONTENT_VERSION__PARENT_ID, first.getId());
        editor.undo();
        assertNull(second.getParentId());
        editor.undo();
        assertEquals(MeasurementKind.SAMPLE, measurement.getKind());
        editor.undo();
        assertTrue(region.getInterferents().isEmpty());
    }

    @Test
    void valueOfWrongTypeIsRefusedAndNamesTheFeature() {
        Client client = factory.createClient();
        editor.add(workspace, Literals.WORKSPACE__CLIENTS, client);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> editor.add(client, Literals.CLIENT__PROJECTS, factory.createMeasurement()));
        assertTrue(e.getMessage().contains("'projects'"), e.getMessage());
        // the refused change left nothing on the stack: one undo empties the workspace again
        editor.undo();
        assertFalse(editor.canUndo());
    }
}
