package org.tracegas.importer.jcamp.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;

import org.junit.jupiter.api.Test;

/** Letters of the ASDF forms (IUPAC JCAMP-DX 4.24, McDonald & Wilks 1988; from memory). */
class AsdfEncoderTest {

    @Test
    void letters() {
        assertEquals("@", AsdfEncoder.sqz(0));
        assertEquals("A23", AsdfEncoder.sqz(123));
        assertEquals("i", AsdfEncoder.sqz(-9));
        assertEquals("%", AsdfEncoder.dif(0));
        assertEquals("R", AsdfEncoder.dif(9));
        assertEquals("j0", AsdfEncoder.dif(-10));
        assertEquals("T", AsdfEncoder.dup(2));
        assertEquals("s", AsdfEncoder.dup(9));
        assertEquals("S0", AsdfEncoder.dup(10));
    }

    @Test
    void difDupLinesWithCheckValues() {
        // the same data as difdup.jdx: 5 5 5 5 7 9 11 11 on one line
        assertEquals(List.of("1000 E%UKU%"), AsdfEncoder.encode(new long[] {5, 5, 5, 5, 7, 9, 11, 11}, i -> 1000 + i));
    }

    @Test
    void linesStayWithinEightyCharactersAndRepeatTheLastOrdinate() {
        long[] y = new long[500];
        for (int i = 0; i < y.length; i++) {
            y[i] = (long) (100000 * Math.sin(i * 0.3));
        }
        List<String> lines = AsdfEncoder.encode(y, i -> i);
        for (String line : lines) {
            assertEquals(true, line.length() <= 80, line);
        }
        assertEquals(true, lines.size() > 1);
    }
}
