package org.tracegas.method;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.tracegas.model.AnalysisMethod;
import org.tracegas.model.MethodVersion;
import org.tracegas.model.WorkspaceFactory;
import org.tracegas.qa.basis.PathOrigin;
import org.tracegas.quantify.AnalysisRegion;
import org.tracegas.quantify.Analyte;
import org.tracegas.quantify.WavenumberWindow;

/**
 * A method version in the model and back: the regions the model adds, removes and edits map onto the method
 * text's regions, and what the method text cannot take is named by its field. The method text's rules are those
 * {@link MethodDefinition} documents.
 */
class MethodVersionsTest {

    private final StoredMethod opened = StoredMethodTest.stored();
    private final AnalysisMethod method = WorkspaceFactory.eINSTANCE.createAnalysisMethod();
    private final MethodVersion draft = WorkspaceFactory.eINSTANCE.createMethodVersion();

    MethodVersionsTest() {
        method.setName(opened.method().name());
        method.getVersions().add(draft);
        MethodVersions.fillRegions(draft, opened);
    }

    private org.tracegas.model.AnalysisRegion region(String compound, double low, double high, int baseline) {
        org.tracegas.model.AnalysisRegion r = WorkspaceFactory.eINSTANCE.createAnalysisRegion();
        r.setCompound(compound);
        r.setLowerWavenumber(low);
        r.setUpperWavenumber(high);
        r.setBaselineOrder(baseline);
        return r;
    }

    private String refusal() {
        return assertThrows(IllegalArgumentException.class, () -> MethodVersions.edited(opened, method, draft))
                .getMessage();
    }

    @Test
    void theUneditedModelGivesTheOpenedMethodBack() {
        assertEquals(List.of(1, 2), draft.getRegions().stream().map(r -> r.getOpenedAs()).toList());
        assertEquals(opened.content(), MethodVersions.edited(opened, method, draft).content());
    }

    @Test
    void addedAndRemovedRegionsMapOntoTheMethodTextsRegions() {
        // a second CO region after the first; N2O's region, now the third, stays the method text's second
        org.tracegas.model.AnalysisRegion added = region("CO", 2122, 2128, 0);
        added.getInterferents().add("N2O");
        draft.getRegions().add(1, added);
        draft.getRegions().get(2).setBaselineOrder(3);
        List<Analyte> edited = MethodVersions.edited(opened, method, draft).method().analytes();
        Analyte co = opened.method().analytes().get(0);
        assertEquals(List.of(co.regions().get(0), AnalysisRegion.of(2122, 2128, 0)), edited.get(0).regions(),
                "the opened region keeps its two windows and residual limit; the new one is one window without");
        assertEquals(List.of(AnalysisRegion.of(2130, 2190, 3)), edited.get(1).regions());

        draft.getRegions().remove(0);
        edited = MethodVersions.edited(opened, method, draft).method().analytes();
        assertEquals(List.of(AnalysisRegion.of(2122, 2128, 0)), edited.get(0).regions());
        assertEquals(List.of("N2O"), edited.get(0).interferents());

        // without the N2O region the method fits CO alone, with N2O's references still in it
        draft.getRegions().remove(1);
        StoredMethod coOnly = MethodVersions.edited(opened, method, draft);
        assertEquals(List.of("CO"), coOnly.method().analytes().stream().map(Analyte::compound).toList());
        assertEquals(opened.method().references(), coOnly.method().references());
    }

    @Test
    void whatTheMethodTextCannotTakeIsNamed() {
        draft.getRegions().get(0).setUpperWavenumber(2125);
        assertEquals("region 1: it has 2 windows; change them in the method file", refusal());
        draft.getRegions().get(0).setUpperWavenumber(2120);

        draft.getRegions().add(region("CO", 2300, 2320, 1));
        assertEquals("region 3: the regions of CO must follow one another", refusal());
        draft.getRegions().remove(2);

        draft.getRegions().get(1).setBaselineOrder(4);
        assertEquals("region 2: baselineOrder must be 0..3, was 4", refusal());
        draft.getRegions().get(1).setBaselineOrder(2);

        draft.setPathLength(0);
        assertEquals("path length: must be a positive number of metres, was 0.0", refusal());
        draft.setPathLength(4.85);

        draft.getRegions().clear();
        assertEquals("regions: a method needs at least one region", refusal());
    }

    @Test
    void theAlgorithmAndPathSourceAreTheMethodTextsNames() {
        assertEquals("classical-least-squares", draft.getAlgorithm());
        assertEquals("nominal", draft.getPathSource());
        assertEquals(List.of("nominal", "cts-derived"), MethodVersions.pathSources());
        draft.setPathSource("cts-derived");
        assertEquals(PathOrigin.CTS_DERIVED, MethodVersions.edited(opened, method, draft).pathSource());
        draft.setPathSource("measured");
        assertEquals("path source: 'measured' is none of [nominal, cts-derived]", refusal());
        draft.setPathSource("nominal");

        draft.setAlgorithm("line-list");
        assertTrue(refusal().startsWith("algorithm: line-list computes its spectra from the line lists"), refusal());
        draft.setAlgorithm("least-squares");
        assertTrue(refusal().startsWith("algorithm: 'least-squares' is none of the installed fit algorithms"),
                refusal());
        assertTrue(MethodVersions.algorithms(opened).contains("curve-of-growth"));
        assertTrue(!MethodVersions.algorithms(opened).contains("line-list"));
    }
}
