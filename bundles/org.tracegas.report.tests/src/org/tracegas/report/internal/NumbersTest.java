package org.tracegas.report.internal;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class NumbersTest {

    @Test
    void valueToTheDecimalOfItsUncertainty() {
        // JCGM 100:2008 7.2.6: u with at most two significant digits, the value rounded to match
        assertArrayEquals(new String[] {"23.5", "1.2"}, Numbers.withUncertainty(23.4567, 1.234));
        assertArrayEquals(new String[] {"0.462", "0.046"}, Numbers.withUncertainty(0.46213, 0.0456));
        assertArrayEquals(new String[] {"181", "17"}, Numbers.withUncertainty(181.25, 17.2));
    }

    @Test
    void significantDigits() {
        assertEquals("6.383", Numbers.significant(6.38297872));
        assertEquals("150", Numbers.significant(150.0));
        assertEquals("0.0001212", Numbers.significant(1.2121e-4));
    }
}
