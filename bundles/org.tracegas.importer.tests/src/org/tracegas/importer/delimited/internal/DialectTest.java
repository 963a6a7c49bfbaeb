package org.tracegas.importer.delimited.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import java.util.List;

import org.junit.jupiter.api.Test;

class DialectTest {

    @Test
    void separatorsAndDecimalMark() {
        assertEquals(new Dialect(',', false), Dialect.detect(List.of("x,y", "1.5,2", "2.5,3")));
        assertEquals(new Dialect(';', true), Dialect.detect(List.of("x;y", "1,5;2", "2,5;3")));
        assertEquals(new Dialect(';', false), Dialect.detect(List.of("x;y", "1;2")));
        assertEquals(new Dialect('\t', false), Dialect.detect(List.of("x\ty,z", "1\t2")));
        assertNull(Dialect.detect(List.of("just words", "more words")));
    }

    @Test
    void oneDeviatingLineDoesNotHideTheSeparator() {
        assertEquals(',', Dialect.detect(List.of("x,y", "1,2", "2,3,4", "3,4")).separator());
    }

    @Test
    void numbersWithDecimalComma() {
        Dialect d = new Dialect(';', true);
        assertEquals(-1.5e-3, d.number("-1,5E-3"));
        assertNull(d.number("1.000,5"));
        assertEquals("1", d.fields("\"1\" ; 2")[0]);
    }
}
