package org.tracegas.importer.jcamp.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.tracegas.importer.ImportException;

class LdrScannerTest {

    @Test
    void recordsWithContinuationLinesAndComments() throws Exception {
        List<Ldr> r = LdrScanner.scan("##TITLE=a $$ note\n##COMMENTS=first\nsecond $$ more\n\n##END=\n", "f");
        assertEquals(3, r.size());
        assertEquals("a", r.get(0).value());
        assertEquals("first\nsecond", r.get(1).fullValue());
        assertEquals(2, r.get(1).line());
        assertEquals(3, r.get(1).lastLine());
        assertEquals("END", r.get(2).label());
        assertEquals(5, r.get(2).line());
    }

    @Test
    void labelWithoutEqualsSign() {
        ImportException e = assertThrows(ImportException.class, () -> LdrScanner.scan("##TITLE=a\n##NPOINTS 3\n", "f"));
        assertEquals(2, e.line());
    }

    @Test
    void linesEndWithCrLfLfOrCrAndTheTextAfterTheLastEndIsALine() {
        assertEquals(List.of("a", "b", "c", "d", ""), LdrScanner.lines("a\r\nb\nc\rd\n"));
        assertEquals(List.of("", "", "x"), LdrScanner.lines("\r\r\nx"));
        assertEquals(List.of(""), LdrScanner.lines(""));
    }
}
