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

    @Test
    void theHeadsSettingsAndTheRecipeStepsAreTheMethodTextsAndReadBack() throws Exception {
        assertEquals("shift", draft.getShiftTerm());
        assertEquals("ppm", draft.getReportingUnit());
        assertEquals(1e-7, draft.getTolerance());
        assertEquals(List.of(), draft.getRecipeSteps());
        assertEquals("", draft.getCellConditions(), "a method of classical least squares has no [line-list] block");
        draft.setNonlinearity(true);
        draft.setTolerance(1e-5);
        draft.setMaxAbsorbance(0.8);
        draft.setShiftTerm("shift-and-width");
        draft.setReportingUnit("ppb");
        draft.getRecipeSteps().addAll(List.of("baseline degree=1;regions=2000:2010,2190:2200",
                "shift offset=0.25"));
        StoredMethod edited = MethodVersions.edited(opened, method, draft);
        String head = edited.declaration();
        // the method text's words, as MethodDefinition documents them
        for (String line : List.of("nonlinearity = yes\n", "tolerance = 1.0E-5\n", "max-absorbance = 0.8\n",
                "shift = shift-and-width\n", "reporting-unit = ppb\n",
                "[recipe]\nstep = baseline degree=1;regions=2000:2010,2190:2200\nstep = shift offset=0.25\n")) {
            assertTrue(head.contains(line), line + " in " + head);
        }
        StoredMethod back = StoredMethod.parse(edited.content(), "edited");
        assertEquals(edited, back);
        assertEquals(org.tracegas.quantify.ReportingUnit.PPB, back.method().reportingUnit());
        assertEquals(2, back.recipe().entries().size());
        assertEquals("shift", back.recipe().entries().get(1).stepId());

        // the model of the saved version is the draft again
        MethodVersion reopened = WorkspaceFactory.eINSTANCE.createMethodVersion();
        MethodVersions.fillRegions(reopened, back);
        assertEquals(List.of(draft.isNonlinearity(), draft.getTolerance(), draft.getMaxAbsorbance(),
                draft.getShiftTerm(), draft.getReportingUnit(), draft.getRecipeSteps()), List.of(
                        reopened.isNonlinearity(), reopened.getTolerance(), reopened.getMaxAbsorbance(),
                        reopened.getShiftTerm(), reopened.getReportingUnit(), reopened.getRecipeSteps()));
    }

    @Test
    void settingsAndStepsTheMethodTextCannotTakeAreNamed() {
        draft.setTolerance(0);
        assertEquals("tolerance: must lie between 0 and 1 (the relative change of the concentrations at which the"
                + " fit stops), was 0.0", refusal());
        draft.setTolerance(1.5);
        assertTrue(refusal().startsWith("tolerance: "), refusal());
        draft.setTolerance(1e-6);

        draft.setMaxAbsorbance(Double.NaN);
        assertEquals("max absorbance: must be a positive number, was NaN", refusal());
        draft.setMaxAbsorbance(1);

        draft.setReportingUnit("mg/m3");
        assertEquals("reporting unit: 'mg/m3' is none of [ppm, ppb, percent]", refusal());
        draft.setReportingUnit("percent");

        draft.setShiftTerm("stretch");
        assertEquals("shift: 'stretch' is none of [none, shift, shift-and-width, scale]", refusal());
        // a relative wavenumber scale goes with curve-of-growth only (MethodDefinition's format)
        draft.setShiftTerm("scale");
        assertEquals("shift: scale is not offered by the fit algorithm classical-least-squares, which offers"
                + " [shift, shift-and-width]", refusal());
        draft.setAlgorithm("curve-of-growth");
        assertEquals(org.tracegas.quantify.ShiftTerm.SCALE, MethodVersions.edited(opened, method, draft).method()
                .shiftTerm());

        draft.getRecipeSteps().addAll(List.of("shift offset=0.25", "baseline degree"));
        assertTrue(refusal().startsWith("recipe step 2: "), refusal());
        draft.getRecipeSteps().set(1, "baseline degree=0\nshift offset=1");
        assertTrue(refusal().startsWith("recipe step 2: a step is one line"), refusal());
    }
}
