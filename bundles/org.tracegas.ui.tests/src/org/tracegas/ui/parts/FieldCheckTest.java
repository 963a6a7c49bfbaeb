package org.tracegas.ui.parts;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Set;

import org.junit.jupiter.api.Test;
import org.tracegas.preprocess.StepRegistry;

class FieldCheckTest {

    @Test
    void messagesNameTheFieldAndTheProblem() {
        assertNull(FieldCheck.text("Compound", "CO"));
        assertEquals("Compound: must not be empty", FieldCheck.text("Compound", "  "));
        assertNull(FieldCheck.wavenumber("Lower wavenumber", " 2085.5 "));
        assertEquals("Lower wavenumber: 'abc' is not a number", FieldCheck.wavenumber("Lower wavenumber", "abc"));
        // 400 to 5000 cm-1 is the accepted mid-infrared span (common practice, no source)
        assertEquals("Upper wavenumber: 5001 cm⁻¹ lies outside 400 to 5000 cm⁻¹",
                FieldCheck.wavenumber("Upper wavenumber", "5001"));
        assertNull(FieldCheck.order("2000", "2100"));
        assertEquals("Upper wavenumber: must lie above the lower wavenumber 2100 cm⁻¹", FieldCheck.order("2100", "2100"));
        assertNull(FieldCheck.order("x", "2100"), "an unreadable bound is reported by its own check");
    }

    @Test
    void methodSettingsAreCheckedWithTheFieldNamed() {
        // baseline orders 0..3 as the method text takes them (MethodDefinition, quantify.AnalysisRegion)
        assertNull(FieldCheck.baselineOrder(" 3 "));
        assertEquals("Baseline order: must be 0 to 3, was -1", FieldCheck.baselineOrder("-1"));
        assertEquals("Baseline order: '1.5' is not a whole number from 0 to 3", FieldCheck.baselineOrder("1.5"));
        assertNull(FieldCheck.pathLength("6.4"));
        assertEquals("Path length: must be a positive number of metres, was -2", FieldCheck.pathLength(" -2"));
        assertEquals("Path length: 'six' is not a number", FieldCheck.pathLength("six"));
        assertNull(FieldCheck.maxIterations("50"));
        assertEquals("Max. fit iterations: must be at least 1, was 0", FieldCheck.maxIterations("0"));
        // a relative change, so between 0 and 1 (MethodDefinition's tolerance, QuantificationMethod's check)
        assertNull(FieldCheck.tolerance("1e-6"));
        assertEquals("Tolerance: must be between 0 and 1 (a relative change), was 0", FieldCheck.tolerance("0"));
        assertEquals("Tolerance: 'tight' is not a number", FieldCheck.tolerance("tight"));
        assertNull(FieldCheck.maxAbsorbance("1.0"));
        assertEquals("Max. absorbance: must be a positive number, was Infinity", FieldCheck.maxAbsorbance("Infinity"));
    }

    @Test
    void recipeStepsMustBeStepsTheDeskRunsWithTheirParameters() {
        StepRegistry steps = StepRegistry.withBuiltInSteps();
        assertEquals(List.of("baseline degree=1;regions=2000:2010", "shift offset=0.1"),
                FieldCheck.lines(" baseline degree=1;regions=2000:2010 \n\n  shift offset=0.1\n"));
        assertNull(FieldCheck.recipeSteps(List.of("baseline degree=1;regions=2000:2010", "shift offset=0.1"), steps));
        assertNull(FieldCheck.recipeSteps(List.of(), steps), "a method may process nothing before the fit");
        String unknown = FieldCheck.recipeSteps(List.of("shift offset=0.1", "smooth width=3"), steps);
        assertTrue(unknown.startsWith("Recipe step 2: ") && unknown.contains("smooth"), unknown);
        String missing = FieldCheck.recipeSteps(List.of("shift halfWidth=8"), steps);
        assertTrue(missing.startsWith("Recipe step 1: ") && missing.contains("offset"), missing);
        String unparsed = FieldCheck.recipeSteps(List.of("shift offset"), steps);
        assertTrue(unparsed.startsWith("Recipe step 1: "), unparsed);
    }

    @Test
    void interferentsAreNamedOnceNotTheAnalyteAndOnlyCompoundsTheMethodHasReferencesOf() {
        Set<String> known = Set.of("CO", "H2O", "N2O");
        assertNull(FieldCheck.interferents(" H2O , N2O ", "CO", known));
        assertNull(FieldCheck.interferents("", "CO", known), "an analyte may have no interferents");
        assertEquals(List.of("H2O", "N2O"), FieldCheck.split(" H2O , N2O "));
        assertEquals(List.of(), FieldCheck.split("  "));
        assertEquals("Interferents: an empty name in 'H2O,,N2O'; separate compounds by commas",
                FieldCheck.interferents("H2O,,N2O", "CO", known));
        assertEquals("Interferents: CO is the analyte itself", FieldCheck.interferents("CO", "CO", known));
        assertEquals("Interferents: H2O is named twice", FieldCheck.interferents("H2O, H2O", "CO", known));
        assertEquals("Interferents: the method has no reference of 'CO2' (it has CO, H2O, N2O)",
                FieldCheck.interferents("CO2", "CO", known));
    }
}
