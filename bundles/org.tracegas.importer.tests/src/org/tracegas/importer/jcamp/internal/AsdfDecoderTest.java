package org.tracegas.importer.jcamp.internal;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.tracegas.importer.ImportException;

/** Single lines decoded by the ASDF rules of IUPAC JCAMP-DX 4.24 (McDonald & Wilks 1988; from memory). */
class AsdfDecoderTest {

    private static AsdfDecoder.DecodedLine decode(String line) throws ImportException {
        return AsdfDecoder.decode(line, "f.jdx", 7, "##XYDATA", 1000);
    }

    @Test
    void multiDigitSqzAndDifWithSigns() throws Exception {
        // a23 = -123 (SQZ a = -1 then digits 23); J5 = +15 gives -108; j5 = -15 gives -123
        AsdfDecoder.DecodedLine d = decode("100a23J5j5");
        assertEquals(100.0, d.x());
        assertArrayEquals(new double[] {-123, -108, -123}, d.ys(), 0.0);
        assertTrue(d.endsInDif());
    }

    @Test
    void multiDigitRepeatCount() throws Exception {
        // @ = 0, J = +1, S0 = DUP 10: the difference +1 occurs ten times in all, giving 1..10
        double[] ys = decode("1@JS0").ys();
        assertEquals(11, ys.length);
        for (int i = 0; i <= 10; i++) {
            assertEquals(i, ys[i], 0.0);
        }
    }

    @Test
    void repeatOfAnAbsoluteValueDoesNotEndInDif() throws Exception {
        // SQZ E = 5 with DUP U = 3 occurrences
        AsdfDecoder.DecodedLine d = decode("0EU");
        assertArrayEquals(new double[] {5, 5, 5}, d.ys(), 0.0);
        assertFalse(d.endsInDif());
    }

    @Test
    void pacAndExponent() throws Exception {
        assertArrayEquals(new double[] {1, 2, -3}, decode("0+1+2-3").ys(), 0.0);
        // "1E+2" with a sign after E is an AFFN exponent; "1E2" would be 1 followed by SQZ E2 = 52
        assertEquals(100.0, decode("1E+2 3").x());
        assertArrayEquals(new double[] {52}, decode("1E2").ys(), 0.0);
        assertArrayEquals(new double[] {2.5, -0.25}, decode("0 2.5 -.25").ys(), 0.0);
    }

    @Test
    void malformedLinesNameLineAndColumn() {
        ImportException e = assertThrows(ImportException.class, () -> decode("0 J5"));
        assertEquals(7, e.line());
        assertTrue(e.reason().contains("DIF"), e.getMessage());
        assertTrue(assertThrows(ImportException.class, () -> decode("0 1 x")).reason().contains("column 5"));
        assertThrows(ImportException.class, () -> decode("0 1 ?"));
        assertThrows(ImportException.class, () -> decode("0 1.2.3"));
        assertThrows(ImportException.class, () -> decode("0 1TT"));
        assertThrows(ImportException.class, () -> decode("   "));
    }
}
