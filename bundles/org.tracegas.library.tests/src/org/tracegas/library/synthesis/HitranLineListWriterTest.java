package org.tracegas.library.synthesis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * Records in the HITRAN 2004+ layout (Rothman et al., JQSRT 96, 139 (2005), table 1: molecule I2 in columns 1-2,
 * isotopologue I1 in 3, wavenumber F12.6 in 4-15, intensity E10.3 in 16-25, Einstein A E10.3 in 26-35, air
 * half width F5.4 in 36-40, self half width F5.3 in 41-45, lower-state energy F10.4 in 46-55, temperature exponent
 * F4.2 in 56-59, pressure shift F8.6 in 60-67, 160 characters in all; from memory of the HITRAN format
 * description). That the reader reads the records back is checked in {@link HitranLineListReaderTest}.
 */
class HitranLineListWriterTest {

    private static final SpectralLine LINE = new SpectralLine(5, 1, 2147.081139, 1.815e-19, 18.47, 0.0593, 0.066,
            57.6704, 0.73, -0.00299);

    @Test
    void fieldsStandInTheirColumns() {
        String r = HitranLineListWriter.record(LINE);
        assertEquals(160, r.length());
        assertEquals(" 5", r.substring(0, 2));
        assertEquals("1", r.substring(2, 3));
        assertEquals(" 2147.081139", r.substring(3, 15));
        assertEquals(" 1.815E-19", r.substring(15, 25));
        assertEquals(" 1.847E+01", r.substring(25, 35));
        assertEquals(".0593", r.substring(35, 40));
        assertEquals("0.066", r.substring(40, 45));
        assertEquals("   57.6704", r.substring(45, 55));
        assertEquals("0.73", r.substring(55, 59));
        assertEquals("-.002990", r.substring(59, 67));
        assertTrue(r.substring(67).isBlank());
    }

    @Test
    void aValueBeyondItsColumnsIsRefusedNamingTheField() {
        SpectralLine wide = new SpectralLine(5, 1, 2147.08, 1e-19, 1, 0.0593, 12.5, 57.67, 0.73, 0);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> HitranLineListWriter.record(wide));
        assertTrue(e.getMessage().contains("self half width"), e.getMessage());
    }
}
