package org.tracegas.library.synthesis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

class LineListTest {

    private static SpectralLine at(double wavenumber) {
        return new SpectralLine(5, 1, wavenumber, 1e-20, 1.0, 0.07, 0.08, 10, 0.7, 0.0);
    }

    @Test
    void sortsByWavenumber() {
        LineList list = new LineList("test", List.of(at(2200), at(2100), at(2150)));
        assertEquals(2100, list.get(0).wavenumber(), 0);
        assertEquals(2200, list.get(2).wavenumber(), 0);
        assertTrue(list.toString().contains("3 lines, 2100.0 .. 2200.0 cm-1"), list.toString());
    }

    @Test
    void rejectsAnEmptyListByName() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new LineList("co.par", List.of()));
        assertTrue(e.getMessage().contains("co.par"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> at(-1));
    }
}
