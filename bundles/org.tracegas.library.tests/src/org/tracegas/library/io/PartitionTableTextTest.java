package org.tracegas.library.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.library.synthesis.PartitionFunction;
import org.tracegas.library.synthesis.PublishedMolecularConstants;
import org.tracegas.library.synthesis.TabulatedPartitionFunction;

class PartitionTableTextTest {

    @TempDir
    Path dir;

    @Test
    void tableWrittenIn2KStepsReadsBackWithinTwoTenthsOfAPerMille() throws IOException {
        // linear interpolation between 2 K nodes errs by at most h^2/8 Q''/Q (trapezoid error bound), with
        // Q''/Q = (d ln Q/dT)^2 + d2 ln Q/dT2 about 3.3e-4 K^-2 for SF6 near 450 K (its Q doubles every 50 K)
        PartitionFunction sf6 = PublishedMolecularConstants.forFormula("SF6").orElseThrow();
        Path file = dir.resolve("sf6-q.txt");
        Files.writeString(file, PartitionTableText.of(sf6, 200, 700, 2));
        TabulatedPartitionFunction table = PartitionTableText.read(file);
        for (double t : new double[] {200, 296, 453.0, 438.15, 470.0, 699}) {
            assertEquals(sf6.value(t), table.value(t), 2e-4 * sf6.value(t), "T = " + t);
        }
        assertTrue(table.description().startsWith("Q(T) table sf6-q.txt (rigid rotor"), table.description());
    }

    @Test
    void badRowsAreNamedByFileLineAndColumn() throws IOException {
        Path file = dir.resolve("bad.txt");
        Files.writeString(file, "# test\n300 100\n290 95\n");
        FileFormatException e = assertThrows(FileFormatException.class, () -> PartitionTableText.read(file));
        assertEquals(3, e.line());
        assertEquals("temperature", e.field());
        Files.writeString(file, "300 100\n310 abc\n");
        e = assertThrows(FileFormatException.class, () -> PartitionTableText.read(file));
        assertEquals(2, e.line());
        assertEquals("Q", e.field());
        Files.writeString(file, "300 100\n");
        e = assertThrows(FileFormatException.class, () -> PartitionTableText.read(file));
        assertTrue(e.getMessage().contains("at least 2 rows"), e.getMessage());
    }
}
