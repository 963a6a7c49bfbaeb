package org.tracegas.library.synthesis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

class LineCutoffTest {

    @Test
    void fixedDistanceIgnoresTheWidth() {
        assertEquals(25.0, LineCutoff.standard().distance(0.07), 0);
        assertEquals(25.0, LineCutoff.standard().distance(3.0), 0);
        assertEquals("25.0 cm-1", LineCutoff.standard().toString());
    }

    @Test
    void halfWidthCountScalesWithTheLine() {
        assertEquals(35.0, LineCutoff.halfWidths(500).distance(0.07), 1e-12);
        assertEquals("500.0 half widths", LineCutoff.halfWidths(500).toString());
    }

    @Test
    void rejectsNonPositiveValues() {
        assertThrows(IllegalArgumentException.class, () -> LineCutoff.wavenumbers(0));
        assertThrows(IllegalArgumentException.class, () -> LineCutoff.halfWidths(Double.NaN));
    }
}
