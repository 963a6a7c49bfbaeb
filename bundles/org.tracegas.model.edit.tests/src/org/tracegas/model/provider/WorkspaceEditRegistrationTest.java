package org.tracegas.model.provider;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.eclipse.emf.edit.domain.AdapterFactoryEditingDomain;
import org.eclipse.emf.edit.provider.IEditingDomainItemProvider;
import org.junit.jupiter.api.Test;
import org.tracegas.model.AnalysisRegion;
import org.tracegas.model.MethodVersion;
import org.tracegas.model.WorkspacePackage;
import org.tracegas.model.WorkspaceFactory;
import org.tracegas.model.edit.ModelEditor;

/**
 * The item providers registered by this bundle's plugin.xml serve the method editor's editing domain: its
 * commands are built by the generated providers, and an edit through them can be undone.
 */
class WorkspaceEditRegistrationTest {

    @Test
    void theMethodEditorsDomainUsesTheGeneratedItemProviders() {
        ModelEditor editor = new ModelEditor();
        MethodVersion version = WorkspaceFactory.eINSTANCE.createMethodVersion();
        editor.createResource("memory:/method.xmi").getContents().add(version);
        AdapterFactoryEditingDomain domain = (AdapterFactoryEditingDomain) editor.domain();
        assertInstanceOf(MethodVersionItemProvider.class,
                domain.getAdapterFactory().adapt(version, IEditingDomainItemProvider.class));

        AnalysisRegion co = WorkspaceFactory.eINSTANCE.createAnalysisRegion();
        editor.add(version, WorkspacePackage.Literals.METHOD_VERSION__REGIONS, co);
        editor.set(co, WorkspacePackage.Literals.ANALYSIS_REGION__UPPER_WAVENUMBER, 2240.0);
        assertEquals(2240.0, co.getUpperWavenumber());
        editor.undo();
        editor.undo();
        assertTrue(version.getRegions().isEmpty());
    }
}
