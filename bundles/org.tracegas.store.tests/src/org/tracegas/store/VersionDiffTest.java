package org.tracegas.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Map;

import org.junit.jupiter.api.Test;

class VersionDiffTest {

    @Test
    void reportsAddedRemovedAndChangedKeys() {
        VersionDiff d = VersionDiff.of("v1", "a=1\nb=2\nc=3\n", "v2", "a=1\nb=20\nd=4\n");
        assertEquals(Map.of("d", "4"), d.added());
        assertEquals(Map.of("c", "3"), d.removed());
        assertEquals(Map.of("b", new VersionDiff.Change("2", "20")), d.changed());
    }

    @Test
    void sameFieldsInAnotherOrderAreNoDifference() {
        assertTrue(VersionDiff.of("v1", "a=1\nb=x=y\n", "v2", "b=x=y\na=1").isEmpty());
    }

    @Test
    void malformedLineIsNamedWithVersionAndLine() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> VersionDiff.of("v1", "a=1\nno separator\n", "v2", ""));
        assertTrue(e.getMessage().contains("version v1, line 2"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> VersionDiff.of("v1", "", "v2", "a=1\na=2\n"));
        assertTrue(e.getMessage().contains("'a' occurs twice"), e.getMessage());
    }
}
