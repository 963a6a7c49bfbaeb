package org.tracegas.ui.parts;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import java.util.List;
import java.util.Set;

import org.junit.jupiter.api.Test;

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
