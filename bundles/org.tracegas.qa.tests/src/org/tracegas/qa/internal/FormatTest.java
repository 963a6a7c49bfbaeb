package org.tracegas.qa.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class FormatTest {

    @Test
    void fourSignificantDigitsWithoutTrailingZeros() {
        assertEquals("70", Format.number(70.0));
        assertEquals("9.5", Format.number(9.5));
        assertEquals("0.0005", Format.number(5e-4));
        assertEquals("6.383", Format.number(6.382978723));
        assertEquals("1235", Format.number(1234.5678));
    }
}
