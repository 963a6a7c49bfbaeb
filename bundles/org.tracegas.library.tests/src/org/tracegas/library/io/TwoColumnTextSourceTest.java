package org.tracegas.library.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.Spectrum;

class TwoColumnTextSourceTest {

    @TempDir
    Path dir;

    private Path write(String name, String text) throws IOException {
        Path file = dir.resolve(name);
        Files.writeString(file, text);
        return file;
    }

    @Test
    void readsEvenlySpacedColumnsAsAUniformAxis() throws IOException {
        Spectrum s = new TwoColumnTextSource()
                .read(write("a.txt", "# CO\n2000.0, 0.01\n2000.25;0.02\n\n2000.5 0.03\n"));
        assertTrue(s.axis().isUniform());
        assertEquals(0.25, s.axis().step(), 1e-12);
        assertEquals(3, s.size());
        assertEquals(0.03, s.get(2), 0);
        assertEquals(Ordinate.ABSORBANCE, s.ordinate());
    }

    @Test
    void keepsUnevenSpacingPointByPoint() throws IOException {
        Spectrum s = new TwoColumnTextSource().read(write("b.txt", "2400 0.1\n2300 0.2\n2250 0.3\n"));
        assertFalse(s.axis().isUniform());
        assertEquals(2250, s.axis().last(), 0);
    }

    @Test
    void badNumberNamesFileLineAndField() throws IOException {
        Path file = write("c.txt", "2000 0.1\n2001 0.2x\n");
        FileFormatException e = assertThrows(FileFormatException.class, () -> new TwoColumnTextSource().read(file));
        assertEquals(2, e.line());
        assertEquals("absorbance", e.field());
        assertTrue(e.getMessage().startsWith(file.toString() + ", line 2, field 'absorbance'"), e.getMessage());
    }

    @Test
    void wavenumbersMustKeepTheirDirection() throws IOException {
        Path file = write("d.txt", "2000 0.1\n2001 0.2\n2000.5 0.3\n");
        FileFormatException e = assertThrows(FileFormatException.class, () -> new TwoColumnTextSource().read(file));
        assertEquals(3, e.line());
        assertEquals("wavenumber", e.field());
    }

    @Test
    void wrongColumnCountAndTooFewLinesAreRejected() throws IOException {
        Path three = write("e.txt", "2000 0.1 7\n");
        assertEquals(1, assertThrows(FileFormatException.class, () -> new TwoColumnTextSource().read(three)).line());
        Path one = write("f.txt", "# only\n2000 0.1\n");
        assertTrue(assertThrows(FileFormatException.class, () -> new TwoColumnTextSource().read(one)).getMessage()
                .contains("at least 2"));
    }
}
