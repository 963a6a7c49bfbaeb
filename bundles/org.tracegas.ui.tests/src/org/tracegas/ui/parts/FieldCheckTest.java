package org.tracegas.ui.parts;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

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
}
