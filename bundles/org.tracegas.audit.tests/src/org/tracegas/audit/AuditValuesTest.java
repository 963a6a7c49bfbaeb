package org.tracegas.audit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.HashMap;
import java.util.Map;

import org.junit.jupiter.api.Test;

class AuditValuesTest {

    @Test
    void sortsKeysAndEscapesLineBreaks() {
        Map<String, Object> fields = new HashMap<>();
        fields.put("ppm", 12.5);
        fields.put("comment", "line1\nline2 \\ end\r");
        fields.put("component", null);
        assertEquals("comment=line1\\nline2 \\\\ end\\r\ncomponent=\\0\nppm=12.5\n", AuditValues.canonical(fields));
    }

    @Test
    void equalValuesGiveEqualText() {
        Map<String, Object> a = new HashMap<>(Map.of("b", 1, "a", 2));
        Map<String, Object> b = new java.util.TreeMap<>(Map.of("a", 2, "b", 1));
        assertEquals(AuditValues.canonical(a), AuditValues.canonical(b));
    }

    @Test
    void literalBackslashZeroDiffersFromNull() {
        Map<String, Object> literal = new HashMap<>();
        literal.put("k", "\\0");
        Map<String, Object> nothing = new HashMap<>();
        nothing.put("k", null);
        assertTrue(!AuditValues.canonical(literal).equals(AuditValues.canonical(nothing)));
    }

    @Test
    void refusesKeysThatWouldBreakTheFormat() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> AuditValues.canonical(Map.of("a=b", 1)));
        assertTrue(e.getMessage().startsWith("fields: key 'a=b'"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> AuditValues.canonical(Map.of("a\nb", 1)));
    }
}
